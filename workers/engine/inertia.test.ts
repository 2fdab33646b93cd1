import { describe, expect, it } from 'vitest';
import { relaxationTime } from '../../shared/physics/index';
import { onlyBin, prepareTest } from './engine.test-helper';
import { Kernel } from './kernel';
import { releaseParticles } from './release';
import { batchStream } from './rng';
import { walk } from './walk';

function thrown(diameter_m: number, speed_mPerS: number) {
  const p = prepareTest(
    {
      room: { eddyDiffusivity_m2PerS: 0 },
      dust: { density_kgPerM3: 1000, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: diameter_m, gsd: 1 } },
      run: { particles: 2, batches: 2, seed: 1, duration_s: 600 },
    },
    (q) => q.bins.brownianDiffusivity_m2PerS.fill(0),
  );
  const rng = batchStream(p.seed, 0);
  const a = releaseParticles(p, rng);
  const i = a.bin.findIndex((b) => b === onlyBin(p));
  const k = new Kernel(p, a, rng);
  a.ux[i] = speed_mPerS;
  a.uy[i] = 0;
  a.uz[i] = 0;
  const start = { x: a.x[i], z: a.z[i], t: a.t[i] };
  walk(k, i);
  return { p, b: onlyBin(p), dx: a.x[i] - start.x, dz: a.z[i] - start.z, dt: a.t[i] - start.t, ux: a.ux[i] };
}

describe('particles that carry a velocity', () => {
  it('a 50 µm sphere thrown at 5 m/s into still air stops within V·τ and sinks as V_TS·(t − τ(1 − e^(−t/τ))) (Hinds Eqs. 5.19, 3.24)', () => {
    const { p, b, dx, dz, dt } = thrown(50e-6, 5);
    const vs = p.bins.settling_mPerS[b];
    const tau = vs / 9.81;
    // The drag-corrected τ stays within 10 % of Stokes' ρd²Cc/(18μ) at this size (Re ≈ 0.4).
    expect(tau / relaxationTime(50e-6, 1000)).toBeGreaterThan(0.9);
    expect(dt).toBeGreaterThan(5 * tau);
    expect(dx).toBeCloseTo(5 * tau * (1 - Math.exp(-dt / tau)), 9);
    expect(-dz).toBeCloseTo(vs * (dt - tau * (1 - Math.exp(-dt / tau))), 9);
  });

  it('a respirable 2 µm sphere relaxes faster than the shortest step and simply follows the air', () => {
    const { dx } = thrown(2e-6, 5);
    expect(dx).toBe(0);
  });
});
