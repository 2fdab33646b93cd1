import { describe, expect, it } from 'vitest';
import { bindFields, bindNumberFields } from './bind-fields';

// Expected values worked out by hand from the arguments below.
describe('bindFields', () => {
  const values = { name: 'Quartz', density: '2650' };
  const errors = { name: 'Required', 'data.density_kgPerM3': 'Too large' };

  it('gives the key’s value and the message at the key, or at the path the payload nests it under', () => {
    const field = bindFields(values, () => {}, errors);
    expect(field('name')).toMatchObject({ value: 'Quartz', error: 'Required' });
    expect(field('density')).toMatchObject({ value: '2650', error: undefined });
    expect(field('density', 'data.density_kgPerM3')).toMatchObject({ value: '2650', error: 'Too large' });
  });

  it('writes a change to that key alone', () => {
    let next: typeof values | undefined;
    bindFields(values, (v) => (next = v), errors)('density').onChange({ target: { value: '1500' } });
    expect(next).toEqual({ name: 'Quartz', density: '1500' });
  });
});

// Expected values worked out by hand from the arguments below.
describe('bindNumberFields', () => {
  const room = { length_m: 6, airChanges_perH: undefined as number | undefined };
  const errors = { 'room.length_m': 'Too small' };

  it('gives the value, or the default for a key left out, and the message under the branch path', () => {
    const field = bindNumberFields(room, () => {}, errors, 'room');
    expect(field('length_m')).toMatchObject({ value: 6, error: 'Too small' });
    expect(field('airChanges_perH', 4)).toMatchObject({ value: 4, error: undefined });
  });

  it('writes a number to that key alone', () => {
    let next: typeof room | undefined;
    bindNumberFields(room, (v) => (next = v), errors, 'room')('airChanges_perH', 4).onValue(2);
    expect(next).toEqual({ length_m: 6, airChanges_perH: 2 });
  });
});
