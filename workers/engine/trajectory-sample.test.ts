import { describe, expect, it } from 'vitest';
import { combineBatches } from './combine';
import { prepareTest, runAll } from './engine.test-helper';
import { runBatch } from './run-batch';
import { END_STRIDE } from './trajectory-sample';
import { FATES } from './types';
import { workstation } from './workstation.test-helper';

// A 20-minute task in the workstation bench; the sample sizes are the product's own choice (issue 17: at least 500 paths).
const bench = { ...workstation, hoods: [{ ...workstation.hoods[0], airflow_m3PerS: 0.05 }], run: { particles: 4000, batches: 8, seed: 3 } };

describe('trajectory sample', () => {
  const p = prepareTest(bench);
  const batches = runAll(p);
  const t = combineBatches(p, batches).trajectories;

  it('holds at least 500 paths, drawn from every batch, with frames over the whole task', () => {
    expect(t.particles).toBeGreaterThanOrEqual(500);
    expect(t.bins.length).toBe(t.particles);
    for (const b of batches) expect(b.trajectoryBins.some((bin) => bin >= 0)).toBe(true);
    expect(t.frames * t.frameInterval_s).toBeCloseTo(p.duration_s, 9);
    const released = Array.from({ length: t.particles }, (_, k) => t.ends![k * END_STRIDE]);
    expect(Math.min(...released)).toBeLessThan(0.1 * p.duration_s);
    expect(Math.max(...released)).toBeGreaterThan(0.9 * p.duration_s);
  });

  it('keeps a fate per path that agrees with where the path ends', () => {
    const seen = new Set<number>();
    for (let k = 0; k < t.particles; k++) {
      const fate = FATES[t.fates![k]];
      seen.add(t.fates![k]);
      const [released, , , , ended, , , z] = t.ends!.subarray(k * END_STRIDE, (k + 1) * END_STRIDE);
      expect(ended).toBeGreaterThanOrEqual(released);
      if (fate === 'settled') expect(z).toBe(0);
      if (fate === 'airborne') expect(ended).toBeCloseTo(p.duration_s, 1);
      if (fate === 'exhausted' || fate === 'captured') expect(ended).toBeLessThan(p.duration_s);
    }
    expect(seen.size).toBeGreaterThanOrEqual(3);
  });

  it('records positions only between release and end, in whole centimetres', () => {
    for (let k = 0; k < t.particles; k++) {
      const released = t.ends![k * END_STRIDE];
      const ended = t.ends![k * END_STRIDE + 4];
      for (let f = 0; f < t.frames; f++) {
        const x = t.positions_m[(k * t.frames + f) * 3];
        if (Number.isNaN(x)) continue;
        const time = f * t.frameInterval_s;
        expect(time).toBeGreaterThanOrEqual(released);
        expect(time).toBeLessThanOrEqual(ended);
        expect(Math.abs(x * 100 - Math.round(x * 100))).toBeLessThan(1e-3);
      }
    }
  });

  // With variance reduction the sampled particles are exempt from splitting and roulette (so every
  // path is whole and ends in a fate), which is a different, equally unbiased walk for them: the
  // check that recording itself changes nothing is made on the plain walk.
  it('does not change the walk: a plain run without the sample reproduces the same tallies', () => {
    const plainBench = { ...bench, run: { ...bench.run, varianceReduction: false } };
    const recorded = runAll(prepareTest(plainBench));
    const without = prepareTest(plainBench, (q) => (q.trajectory = { ...q.trajectory, particles: 0 }));
    const plain = runAll(without);
    recorded.forEach((b, i) => {
      expect(plain[i].particleSteps).toBe(b.particleSteps);
      expect(Array.from(plain[i].fateMass_mg)).toEqual(Array.from(b.fateMass_mg));
      expect(Array.from(plain[i].zoneResidence_s)).toEqual(Array.from(b.zoneResidence_s));
    });
  });

  // A run to a precision plans its first look (p.batches) and may go on to 2,560 batches; the sample is the planned
  // batches' paths, so a long run stays as small to save as a short one (the server takes 8 MB of JSON).
  it('keeps the planned batches’ paths however many more batches a run to a precision adds', () => {
    const more = Array.from({ length: 3 * p.batches }, (_, k) => (k < p.batches ? batches[k] : runBatch(p, k)));
    const long = combineBatches(p, more).trajectories;
    expect(long.particles).toBe(t.particles);
    expect(Array.from(long.positions_m)).toEqual(Array.from(t.positions_m));
    expect(Array.from(long.bins)).toEqual(Array.from(t.bins));
    expect(long.particles).toBeLessThanOrEqual(p.trajectory.particles * p.batches);
  });
});
