import { describe, expect, it } from 'vitest';
import { bindFields } from './bind-fields';

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
