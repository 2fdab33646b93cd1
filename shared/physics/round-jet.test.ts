import { describe, it, expect } from 'vitest';
import { bisect } from './root';
import {
  jetCentrelineSpeed,
  jetDiffusivityAndGradient,
  jetEddyDiffusivity,
  jetHalfWidth,
  jetVelocity,
  jetVolumeFlux,
  type RoundJet,
} from './index';

const out = new Float64Array(3);
const U0 = 50;
const D0 = 0.02;

// The jet along +x from the origin, and the same jet from (ox, oy, oz) along the unit vector (ex, ey, ez).
const ALONG_X: RoundJet = { ox_m: 0, oy_m: 0, oz_m: 0, ex: 1, ey: 0, ez: 0, speed_mPerS: U0, diameter_m: D0 };
const aimed = (ox_m: number, oy_m: number, oz_m: number, ex: number, ey: number, ez: number): RoundJet => ({
  ...ALONG_X,
  ox_m,
  oy_m,
  oz_m,
  ex,
  ey,
  ez,
});

// Axial speed of a jet along +x from the origin, at axial distance x and radius r off the axis.
function axialSpeed(x_m: number, r_m: number): number {
  jetVelocity(ALONG_X, x_m, r_m, 0, out);
  return out[0];
}

// ∫ f(u)·2πr dr over 0..8 r½ by Simpson's rule, f = u for volume flux, u² for momentum flux.
function radialIntegral(x_m: number, power: number): number {
  const outer_m = 8 * jetHalfWidth(x_m, D0);
  const n = 2000;
  const h = outer_m / n;
  let sum = 0;
  for (let i = 0; i <= n; i++) {
    const r = i * h;
    const w = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
    sum += w * axialSpeed(x_m, r) ** power * 2 * Math.PI * r;
  }
  return (sum * h) / 3;
}

const NOZZLE_FLUX = (U0 * Math.PI * D0 * D0) / 4;

describe('round free jet', () => {
  it('decays as u_c = B·u₀·d₀/x with B in the measured 5.7–6.1 ([M] Pope Table 5.1: Hussein et al. 1994, Panchapakesan & Lumley 1993)', () => {
    for (const x_m of [20 * D0, 50 * D0, 100 * D0]) {
      const b = (axialSpeed(x_m, 0) * x_m) / (U0 * D0);
      expect(b).toBeGreaterThan(5.7);
      expect(b).toBeLessThan(6.1);
    }
  });

  it('keeps the nozzle speed along a potential core of about 6 d₀ ([M] Pope ch. 5)', () => {
    expect(axialSpeed(3 * D0, 0)).toBe(U0);
    expect(axialSpeed(5.5 * D0, 0)).toBe(U0);
    expect(axialSpeed(7 * D0, 0)).toBeLessThan(0.9 * U0);
  });

  it('halves its speed at r½ = 0.094–0.102·x ([M] Pope Table 5.1), found by bisection on the field', () => {
    for (const x_m of [20 * D0, 60 * D0]) {
      const centre = axialSpeed(x_m, 0);
      const r_m = bisect((r) => axialSpeed(x_m, r) - centre / 2, 0, x_m);
      expect(r_m / x_m).toBeGreaterThan(0.094);
      expect(r_m / x_m).toBeLessThan(0.102);
    }
  });

  it('entrains air as Q(x)/Q₀ ≈ 0.32·x/d₀ within 5 % ([M] Ricou & Spalding 1961, from memory)', () => {
    for (const x_m of [20 * D0, 50 * D0, 100 * D0]) {
      const ratio = radialIntegral(x_m, 1) / NOZZLE_FLUX;
      expect(Math.abs(ratio / (0.32 * (x_m / D0)) - 1)).toBeLessThan(0.05);
      expect(jetVolumeFlux(x_m, U0, D0) / radialIntegral(x_m, 1)).toBeCloseTo(1, 6);
    }
  });

  it('carries the nozzle momentum flux u₀²·π·d₀²/4 within 5 % downstream of the core (momentum conservation, [S] Pope ch. 5)', () => {
    for (const x_m of [10 * D0, 40 * D0]) {
      expect(Math.abs(radialIntegral(x_m, 2) / ((U0 * U0 * Math.PI * D0 * D0) / 4) - 1)).toBeLessThan(0.05);
    }
  });

  it('is divergence-free off the axis, in the core and in the far field ([C] continuity by central differences)', () => {
    const h = 1e-6;
    for (const [x, y, z] of [
      [3 * D0, 0.005, 0.002],
      [30 * D0, 0.03, -0.04],
      [80 * D0, 0.3, 0.2],
    ]) {
      const terms = [0, 1, 2].map((axis) => {
        const step = [0, 0, 0];
        step[axis] = h;
        jetVelocity(ALONG_X, x + step[0], y + step[1], z + step[2], out);
        const ahead = out[axis];
        jetVelocity(ALONG_X, x - step[0], y - step[1], z - step[2], out);
        return (ahead - out[axis]) / (2 * h);
      });
      expect(Math.abs(terms[0] + terms[1] + terms[2])).toBeLessThan(1e-4 * Math.max(...terms.map(Math.abs)));
    }
  });

  it('draws air in from the side at the entrainment rate: −2π·r·v → dQ/dx far from the axis ([C] continuity)', () => {
    const x_m = 40 * D0;
    const r_m = 5 * jetHalfWidth(x_m, D0);
    jetVelocity(ALONG_X, x_m, r_m, 0, out);
    const entrainment = -2 * Math.PI * r_m * out[1];
    const slope = (jetVolumeFlux(x_m + 1e-4, U0, D0) - jetVolumeFlux(x_m - 1e-4, U0, D0)) / 2e-4;
    expect(entrainment / slope).toBeCloseTo(1, 3);
  });

  it('points along any unit direction: the same jet aimed along (1, 1, 0)/√2 from (1, 2, 3)', () => {
    const e = Math.SQRT1_2;
    const x_m = 30 * D0;
    jetVelocity(aimed(1, 2, 3, e, e, 0), 1 + e * x_m, 2 + e * x_m, 3.01, out);
    const speed = Math.hypot(out[0], out[1], out[2]);
    jetVelocity(ALONG_X, x_m, 0, 0.01, out);
    expect(speed).toBeCloseTo(Math.hypot(out[0], out[1], out[2]), 10);
    jetVelocity(aimed(1, 2, 3, e, e, 0), 0.5, 2, 3, out);
    expect(Math.hypot(out[0], out[1], out[2])).toBe(0);
  });

  it('has its own eddy diffusivity 0.028·u_c·r½ on the axis ([M] Pope ch. 5)', () => {
    const x_m = 40 * D0;
    expect(jetEddyDiffusivity(x_m, 0, U0, D0)).toBeCloseTo(0.028 * jetCentrelineSpeed(x_m, U0, D0) * jetHalfWidth(x_m, D0), 12);
    expect(jetEddyDiffusivity(x_m, jetHalfWidth(x_m, D0), U0, D0) / jetEddyDiffusivity(x_m, 0, U0, D0)).toBeCloseTo(0.5, 12);
  });

  it('gives the walk ∇D that matches central differences of D, in the core and far downstream ([C])', () => {
    const e = [0.6, 0, 0.8];
    const field = new Float64Array(4);
    const d = (x: number, y: number, z: number) => {
      jetDiffusivityAndGradient(aimed(0.1, 0.2, 0.3, e[0], e[1], e[2]), x, y, z, field);
      return field[0];
    };
    const h = 1e-6;
    for (const [x, y, z] of [
      [0.13, 0.21, 0.34],
      [0.5, 0.25, 0.85],
      [1.3, 0.1, 1.9],
    ]) {
      const numeric = [
        (d(x + h, y, z) - d(x - h, y, z)) / (2 * h),
        (d(x, y + h, z) - d(x, y - h, z)) / (2 * h),
        (d(x, y, z + h) - d(x, y, z - h)) / (2 * h),
      ];
      const value = d(x, y, z);
      const scale = Math.max(...numeric.map(Math.abs));
      expect(scale).toBeGreaterThan(0);
      for (let axis = 0; axis < 3; axis++) expect(Math.abs(field[axis + 1] - numeric[axis])).toBeLessThan(1e-5 * scale);
      const axial = (x - 0.1) * e[0] + (y - 0.2) * e[1] + (z - 0.3) * e[2];
      const radial = Math.hypot(x - 0.1 - axial * e[0], y - 0.2, z - 0.3 - axial * e[2]);
      expect(value).toBeCloseTo(jetEddyDiffusivity(axial, radial, U0, D0), 12);
    }
  });
});
