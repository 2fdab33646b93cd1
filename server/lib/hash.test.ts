import { describe, expect, it } from 'vitest';
import { inputHash } from './hash';

describe('inputHash', () => {
  const saved = { room: { length_m: 6 }, run: { particles: 1000, seed: 1 } };

  it('ignores run.varianceReduction, which changes the precision and not the quantity estimated', () => {
    expect(inputHash({ ...saved, run: { ...saved.run, varianceReduction: true } })).toBe(inputHash(saved));
    expect(inputHash({ ...saved, run: { ...saved.run, varianceReduction: false } })).toBe(inputHash(saved));
  });

  it('still tells apart inputs that simulate something else', () => {
    expect(inputHash({ ...saved, run: { ...saved.run, particles: 2000 } })).not.toBe(inputHash(saved));
    expect(inputHash({ ...saved, room: { length_m: 7 } })).not.toBe(inputHash(saved));
  });
});
