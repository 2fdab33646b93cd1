import { describe, it, expect } from 'vitest';
import { eddyContinuousSource, eddyDiffusivityFromVentilation, eddyPuff } from './index';

const source = { generation_mgPerS: 0.1, diffusivity_m2PerS: 0.005 };

// Independent check: a continuous source is the time integral of puffs (Simpson in s = √τ to tame τ → 0).
function integratePuffs(k: number, r: number, t: number): number {
  const steps = 20000;
  const h = Math.sqrt(t) / steps;
  let sum = 0;
  for (let i = 0; i <= steps; i++) {
    const s = i * h;
    const weight = i === 0 || i === steps ? 1 : i % 2 === 1 ? 4 : 2;
    const tau = s * s;
    const puff =
      tau === 0
        ? 0
        : eddyPuff({ mass_mg: source.generation_mgPerS, diffusivity_m2PerS: source.diffusivity_m2PerS, lossRate_perS: k }, r, tau);
    sum += weight * puff * 2 * s;
  }
  return (sum * h) / 3;
}

describe('eddyContinuousSource', () => {
  it('reaches G/(4πDr) at steady state without losses (Carslaw & Jaeger, from memory)', () => {
    expect(eddyContinuousSource(source, 1, Infinity)).toBeCloseTo(0.1 / (4 * Math.PI * 0.005), 12);
  });

  it('follows G/(4πDr)·erfc(r/√(4Dt)) in time without losses (from memory)', () => {
    const expected = (0.1 / (4 * Math.PI * 0.005 * 2)) * 0.31731050786291415;
    expect(eddyContinuousSource(source, 2, 2 ** 2 / (4 * 0.005 * 0.5))).toBeCloseTo(expected, 10);
  });

  it('decays as e^(−r√(k/D)) at steady state with first-order loss (from memory)', () => {
    const withLoss = eddyContinuousSource({ ...source, lossRate_perS: 0.002 }, 1.5, Infinity);
    expect(withLoss).toBeCloseTo((0.1 / (4 * Math.PI * 0.005 * 1.5)) * Math.exp(-1.5 * Math.sqrt(0.002 / 0.005)), 12);
  });

  it.each([0, 1e-3])('equals the time integral of puffs with loss rate %s per second', (k) => {
    for (const [r, t] of [
      [0.5, 60],
      [2, 600],
      [1, 5000],
    ]) {
      const analytic = eddyContinuousSource({ ...source, lossRate_perS: k }, r, t);
      expect(Math.abs(analytic / integratePuffs(k, r, t) - 1)).toBeLessThan(1e-6);
    }
  });

  it('stays finite far from a strongly absorbing source at long times', () => {
    const c = eddyContinuousSource({ ...source, lossRate_perS: 1 }, 50, 1e6);
    expect(Number.isFinite(c)).toBe(true);
    expect(c).toBeGreaterThanOrEqual(0);
  });

  it('doubles on the floor and multiplies by 4 and 8 against a wall and in a corner ([S] image sources)', () => {
    const free = eddyContinuousSource(source, 1, 300);
    expect(eddyContinuousSource({ ...source, boundary: 'floor' }, 1, 300)).toBeCloseTo(2 * free, 12);
    expect(eddyContinuousSource({ ...source, boundary: 'wall-floor' }, 1, 300)).toBeCloseTo(4 * free, 12);
    expect(eddyContinuousSource({ ...source, boundary: 'corner' }, 1, 300)).toBeCloseTo(8 * free, 12);
  });

  it('rejects a zero distance and an unknown boundary, quoting them', () => {
    expect(() => eddyContinuousSource(source, 0, 10)).toThrow(/distance_m.*got 0/);
    // @ts-expect-error the type forbids it; the runtime check guards untyped callers
    expect(() => eddyContinuousSource({ ...source, boundary: 'ceiling' }, 1, 10)).toThrow(/ceiling/);
  });
});

describe('eddyPuff', () => {
  it('follows M/(4πDt)^(3/2)·exp(−r²/(4Dt)) (Carslaw & Jaeger, from memory)', () => {
    const c = eddyPuff({ mass_mg: 10, diffusivity_m2PerS: 0.01 }, 1, 25);
    expect(c).toBeCloseTo((10 / Math.PI ** 1.5) * Math.exp(-1), 12);
  });

  it('conserves the released mass over all space', () => {
    const puff = { mass_mg: 3, diffusivity_m2PerS: 0.004 };
    const steps = 4000;
    const h = 5 / steps;
    let mass = 0;
    for (let i = 1; i <= steps; i++) mass += 4 * Math.PI * (i * h) ** 2 * eddyPuff(puff, i * h, 60) * h;
    expect(mass).toBeCloseTo(3, 6);
  });

  it('rejects a zero time, naming the argument', () => {
    expect(() => eddyPuff({ mass_mg: 1, diffusivity_m2PerS: 0.01 }, 1, 0)).toThrow(/time_s.*got 0/);
  });
});

describe('eddyDiffusivityFromVentilation', () => {
  it('computes (0.52·ACH + 8.61e-5)·V^(2/3) with ACH in s⁻¹ (correlation as in physics.md §4, from memory)', () => {
    expect(eddyDiffusivityFromVentilation(3.6, 27)).toBeCloseTo((0.52e-3 + 8.61e-5) * 9, 12);
  });

  it('lands in the measured indoor range 0.001–0.013 m²/s for ordinary rooms ([S] Cheng et al. 2011)', () => {
    for (const [ach, volume] of [
      [0.5, 30],
      [2, 100],
      [1, 300],
    ]) {
      const d = eddyDiffusivityFromVentilation(ach, volume);
      expect(d).toBeGreaterThan(0.001);
      expect(d).toBeLessThan(0.013);
    }
  });
});
