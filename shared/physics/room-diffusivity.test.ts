import { describe, it, expect } from 'vitest';
import { eddyDiffusivityFromVentilation, roomEddyDiffusivity } from './index';

describe('roomEddyDiffusivity', () => {
  it('clamps the 100 × 100 × 20 m hall at 3 ACH (estimate 1.78 m²/s) to the 0.013 m²/s measured at most in rooms ([S] Cheng et al. 2011)', () => {
    expect(eddyDiffusivityFromVentilation(3, 2e5)).toBeCloseTo(1.78, 2);
    const d = roomEddyDiffusivity(3, 2e5);
    expect(d.value_m2PerS).toBe(0.013);
    expect(d.clamped).toBe(true);
    expect(d.basis).toMatch(/1\.78 m²\/s, lowered to the ceiling of the 0\.001–0\.013/);
  });

  it('keeps a floor of 0.001 m²/s, the least measured, in a small room at ACH 0 ([S] Cheng et al. 2011)', () => {
    const d = roomEddyDiffusivity(0, 27);
    expect(eddyDiffusivityFromVentilation(0, 27)).toBeLessThan(0.001);
    expect(d.value_m2PerS).toBe(0.001);
    expect(d.clamped).toBe(true);
    expect(d.range).toEqual([0.001, 0.013]);
  });

  it('leaves an ordinary room inside the measured range untouched', () => {
    const d = roomEddyDiffusivity(2, 100);
    expect(d.value_m2PerS).toBe(eddyDiffusivityFromVentilation(2, 100));
    expect(d.clamped).toBe(false);
    expect(d.basis).toMatch(/inside the 0\.001–0\.013/);
  });

  it("takes an engineer's range, and rejects one that runs backwards, quoting it", () => {
    expect(roomEddyDiffusivity(3, 2e5, [0.005, 0.05]).value_m2PerS).toBe(0.05);
    expect(() => roomEddyDiffusivity(1, 100, [0.02, 0.01])).toThrow(/\[0\.02, 0\.01\]/);
  });
});
