import { describe, expect, it } from 'vitest';
import { changedFields } from './changes';

describe('changedFields', () => {
  it('names each changed leaf by its dotted path with its old and new value', () => {
    const before = { name: 'Bench 1', data: { worker: { z_m: 1.5, posture: 'standing' }, description: 'grinding' } };
    const after = { name: 'Bench 1', data: { worker: { z_m: 1.1, posture: 'seated' }, description: 'grinding' } };
    expect(changedFields(before, after)).toEqual({
      'data.worker.z_m': { from: 1.5, to: 1.1 },
      'data.worker.posture': { from: 'standing', to: 'seated' },
    });
  });

  it('reports a field that appears or disappears against null, and nothing for an unchanged record', () => {
    expect(changedFields({ a: 1 }, { a: 1, b: null, c: 'x' })).toEqual({ c: { from: null, to: 'x' } });
    expect(changedFields({ a: { b: [1, 2] } }, { a: { b: [1, 2] } })).toEqual({});
  });
});
