import { describe, expect, it } from 'vitest';
import { combineBatches } from './combine';
import { prepareTest, runAll } from './engine.test-helper';
import { releaseParticles } from './release';
import { batchStream } from './rng';
import { workstation } from './workstation.test-helper';

const small = { ...workstation, run: { particles: 800, batches: 2, seed: 5 } };

describe('results for views', () => {
  it('carries each size bin’s aerodynamic and physical diameter as plain arrays', () => {
    const p = prepareTest(small);
    const r = combineBatches(p, runAll(p));
    expect(Array.isArray(r.sizeBins.aerodynamic_m)).toBe(true);
    expect(r.sizeBins.aerodynamic_m).toEqual(Array.from(p.bins.aerodynamic_m));
    expect(r.sizeBins.physical_m).toEqual(Array.from(p.bins.physical_m));
    for (const b of r.trajectories.bins) if (b >= 0) expect(r.sizeBins.aerodynamic_m[b]).toBeGreaterThan(0);
  });

  it('leaves trajectory frames before release NaN, and a particle’s path is one unbroken stretch', () => {
    const p = prepareTest(small, (q) => (q.keepParticles = true));
    const released = releaseParticles(p, batchStream(p.seed, 0));
    const releaseBySlot = new Float64Array(p.trajectory.particles).fill(NaN);
    const particleBySlot = new Int32Array(p.trajectory.particles).fill(-1);
    for (let i = 0; i < released.count; i++) {
      if (released.slot[i] < 0) continue;
      releaseBySlot[released.slot[i]] = released.release[i];
      particleBySlot[released.slot[i]] = i;
    }
    const batch = runAll(p)[0];
    const positions = batch.trajectories;
    const { frames, frameInterval_s } = p.trajectory;
    let lateStarts = 0;
    releaseBySlot.forEach((release, slot) => {
      if (Number.isNaN(release)) return;
      const shown = Array.from({ length: frames }, (_, f) => !Number.isNaN(positions[(slot * frames + f) * 3]));
      const first = shown.indexOf(true);
      if (first < 0) {
        // Never drawn: released after the last frame, or its walk ended (captured, say) before the
        // first frame time at or after its release.
        if (Math.ceil(release / frameInterval_s) >= frames) return;
        expect(batch.particles!.t[particleBySlot[slot]]).toBeLessThan(Math.ceil(release / frameInterval_s) * frameInterval_s);
        return;
      }
      expect(first * frameInterval_s).toBeGreaterThanOrEqual(release);
      expect((first - 1) * frameInterval_s).toBeLessThan(release);
      if (first > 0) lateStarts++;
      const last = shown.lastIndexOf(true);
      expect(shown.slice(first, last + 1).every(Boolean)).toBe(true);
    });
    expect(lateStarts).toBeGreaterThan(0);
  });
});
