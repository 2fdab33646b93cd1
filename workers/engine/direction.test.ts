import { describe, expect, it } from 'vitest';
import { batchTaskMeans, meanAndError, prepareTest, runAll } from './engine.test-helper.ts';
import { combineBatches } from './combine.ts';
import { withAirflow, workstation } from './workstation.test-helper.ts';

// Same seed, same batches: common random numbers, so paired differences carry little noise.
describe('direction checks with common random numbers', () => {
  it('more hood airflow never raises breathing-zone exposure beyond its statistical error', () => {
    const low = prepareTest(withAirflow(0.1));
    const high = prepareTest(withAirflow(0.3));
    const a = batchTaskMeans(low, runAll(low), 'total');
    const b = batchTaskMeans(high, runAll(high), 'total');
    const { mean, se } = meanAndError(b.map((v, i) => v - a[i]));
    // One-sided, 3 standard errors of the paired mean difference (common practice).
    expect(mean).toBeLessThan(3 * se);
    expect(mean).toBeLessThan(0);
  });

  it('bigger particles settle more', () => {
    const settled = (median_m: number) => {
      const p = prepareTest({ ...workstation, hoods: [], dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m, gsd: 1.5 } }, run: { particles: 1600, batches: 4, seed: 4 } });
      return runAll(p).map((r) => r.fateMass_mg[1] / p.emission.emitted_mg);
    };
    const small = settled(3e-6);
    const big = settled(20e-6);
    const { mean, se } = meanAndError(big.map((v, i) => v - small[i]));
    expect(mean).toBeGreaterThan(3 * se);
  });
});

describe('step rule', () => {
  it('halving the step fraction changes results by less than their statistical error', () => {
    const run = (stepFraction: number) => {
      const p = prepareTest({ ...workstation, run: { ...workstation.run, stepFraction, seed: stepFraction === 0.5 ? 31 : 32 } });
      const batches = runAll(p);
      return { p, batches, results: combineBatches(p, batches) };
    };
    const coarse = run(0.5);
    const fine = run(0.25);
    for (const fraction of ['total', 'respirable'] as const) {
      const a = meanAndError(batchTaskMeans(coarse.p, coarse.batches, fraction));
      const b = meanAndError(batchTaskMeans(fine.p, fine.batches, fraction));
      // Independent seeds: 3 standard errors of the difference (common practice).
      expect(Math.abs(a.mean - b.mean), fraction).toBeLessThan(3 * Math.hypot(a.se, b.se));
    }
    const captured = (r: typeof coarse) => meanAndError(r.batches.map((x) => x.fateMass_mg[0] / r.p.emission.emitted_mg));
    const ca = captured(coarse);
    const cb = captured(fine);
    expect(Math.abs(ca.mean - cb.mean)).toBeLessThan(3 * Math.hypot(ca.se, cb.se));
  });
});
