import { describe, expect, it } from 'vitest';
import { onlyBin, prepareTest, runAll } from './engine.test-helper';

// One puff at t = 0 in a room far larger than the spread, so walls never matter.
const puffRoom = { run: { particles: 4000, batches: 2, duration_s: 100, seed: 11 } };

describe('pure diffusion', () => {
  it('gives per-axis variance 2·D·t (Hinds Eq. 7.18) within 4 standard errors', () => {
    const p = prepareTest(puffRoom, (q) => {
      q.bins.settling_mPerS.fill(0);
      q.keepParticles = true;
    });
    const b = onlyBin(p);
    const expected = 2 * p.bins.diffusivity_m2PerS[b] * p.duration_s;
    const xs: number[][] = [[], [], []];
    for (const batch of runAll(p)) {
      const s = batch.particles!;
      for (let i = 0; i < s.x.length; i++) {
        xs[0].push(s.x[i] - 50);
        xs[1].push(s.y[i] - 50);
        xs[2].push(s.z[i] - 50);
      }
    }
    for (const axis of xs) {
      const n = axis.length;
      const variance = axis.reduce((a, v) => a + v * v, 0) / n;
      // Var of a sample variance of normal data: 2σ⁴/n (normal theory).
      expect(Math.abs(variance - expected)).toBeLessThan(4 * expected * Math.sqrt(2 / n));
    }
  });
});

describe('diffusion carried by a draft', () => {
  // Steps here are bound by the drift rule (f·d/|u| with the zone 2–5 m away), not by diffusion,
  // so this checks the random step's spread on drift-bound steps: the mean moves u·t and each
  // axis still spreads 2·D·t about it (Hinds Eq. 7.18; a uniform draft only translates the puff).
  it('moves the mean u·t and keeps per-axis variance 2·D·t', () => {
    const p = prepareTest(
      {
        room: { eddyDiffusivity_m2PerS: 1e-4, draftSpeed_mPerS: 0.05 },
        worker: { x_m: 55, y_m: 52, z_m: 50 },
        run: { particles: 16000, batches: 2, duration_s: 200, seed: 5 },
      },
      (q) => {
        q.bins.settling_mPerS.fill(0);
        q.bins.diffusivity_m2PerS.fill(1e-4);
        q.maxTimeStep_s = 1000;
        q.keepParticles = true;
      },
    );
    const variance = 2 * 1e-4 * 200;
    const xs: number[][] = [[], [], []];
    let steps = 0;
    for (const batch of runAll(p)) {
      const s = batch.particles!;
      steps += batch.particleSteps;
      for (let i = 0; i < s.x.length; i++) {
        xs[0].push(s.x[i] - 50 - 0.05 * 200);
        xs[1].push(s.y[i] - 50);
        xs[2].push(s.z[i] - 50);
      }
    }
    // Drift-bound: about ten steps of 10·d seconds each, far fewer than diffusion would allow.
    expect(steps / xs[0].length).toBeLessThan(30);
    for (const axis of xs) {
      const n = axis.length;
      const mean = axis.reduce((a, v) => a + v, 0) / n;
      expect(Math.abs(mean)).toBeLessThan(4 * Math.sqrt(variance / n));
      const v = axis.reduce((a, x) => a + x * x, 0) / n;
      expect(Math.abs(v - variance)).toBeLessThan(4 * variance * Math.sqrt(2 / n));
    }
  });
});

describe('pure settling', () => {
  const settle = {
    room: { eddyDiffusivity_m2PerS: 0, length_m: 10, width_m: 10, height_m: 3 },
    source: { x_m: 5, y_m: 5, z_m: 2 },
    worker: { x_m: 1, y_m: 1, z_m: 1 },
    dust: { density_kgPerM3: 1000, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 20e-6, gsd: 1 } },
  };

  it('falls V_TS·t in time t (Hinds Eq. 3.21 with drag correction, via settlingVelocity)', () => {
    const p = prepareTest({ ...settle, run: { particles: 400, batches: 2, duration_s: 20 } }, (q) => (q.keepParticles = true));
    const b = onlyBin(p);
    const fall = p.bins.settling_mPerS[b] * 20;
    const spread = Math.sqrt(2 * p.bins.diffusivity_m2PerS[b] * 20);
    for (const batch of runAll(p)) {
      const z = batch.particles!.z;
      const mean = z.reduce((a, v) => a + v, 0) / z.length;
      expect(Math.abs(2 - mean - fall)).toBeLessThan(4 * spread + 1e-9);
    }
  });

  it('reaches the floor after H/V_TS and deposits everything', () => {
    const p = prepareTest({ ...settle, run: { particles: 400, batches: 2, duration_s: 600 } }, (q) => (q.keepParticles = true));
    const b = onlyBin(p);
    const v = p.bins.settling_mPerS[b];
    const arrival = 2 / v;
    const spread = Math.sqrt(2 * p.bins.diffusivity_m2PerS[b] * arrival) / v;
    for (const batch of runAll(p)) {
      const { t, fate } = batch.particles!;
      expect(Array.from(fate).every((f) => f === 1)).toBe(true);
      const mean = t.reduce((a, x) => a + x, 0) / t.length;
      expect(Math.abs(mean - arrival)).toBeLessThan(4 * spread + 1e-9 * arrival);
    }
  });
});
