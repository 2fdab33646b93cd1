import { describe, it, expect } from 'vitest';
import {
  STANDARD_AIR,
  absorptionProbability,
  depositionIntegral,
  depositionVelocities,
  diffusionCoefficient,
  roomDepositionRate,
  settlingVelocity,
} from './index';
import { bisect } from './root';

const U_STAR = 0.01;

// The paper's whole closed form, I = 3.64·Sc^(2/3)·(a − b) + 39 (Lai & Nazaroff 2000).
function paperIntegral(schmidt: number, rPlus: number): number {
  const c = 10.92 * schmidt ** (-1 / 3);
  const part = (y: number) =>
    0.5 * Math.log((c + y) ** 3 / (1 / schmidt + 7.669e-4 * y ** 3)) + Math.sqrt(3) * Math.atan((2 * y - c) / (Math.sqrt(3) * c));
  return 3.64 * schmidt ** (2 / 3) * (part(4.3) - part(rPlus)) + 39;
}

describe('depositionIntegral', () => {
  it("gives the paper's constant 39 for the buffer region when Brownian diffusion vanishes there ([S] Lai & Nazaroff 2000)", () => {
    expect(depositionIntegral(1e12, 4.3)).toBeCloseTo(39, 0);
  });

  it('matches a Simpson integral of 1/(1/Sc + 7.669e-4·y³) over the viscous sublayer ([C])', () => {
    const schmidt = 2e4;
    const n = 20000;
    const from = 1e-3;
    const h = (4.3 - from) / n;
    let sum = 0;
    for (let i = 0; i <= n; i++) {
      const y = from + i * h;
      sum += (i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2) / (1 / schmidt + 7.669e-4 * y ** 3);
    }
    const inner = depositionIntegral(schmidt, from) - depositionIntegral(schmidt, 4.3);
    expect(inner / ((sum * h) / 3)).toBeCloseTo(1, 3);
  });

  it("agrees with the paper's closed form within 1 % from 20 nm up, where its 39 is sound ([S] Lai & Nazaroff 2000)", () => {
    for (const d_m of [2e-8, 1e-7, 1e-6, 1e-5]) {
      const v = depositionVelocities(d_m, 1000, U_STAR);
      const nu = STANDARD_AIR.viscosity_PaS / STANDARD_AIR.density_kgPerM3;
      const rPlus = (d_m * U_STAR) / (2 * nu);
      const schmidt = nu / diffusionCoefficient(d_m);
      expect(Math.abs(v.integral / paperIntegral(schmidt, rPlus) - 1)).toBeLessThan(0.01);
    }
  });

  it('reproduces the tabulated I of 29.1 at 1 nm and 579 at 10 nm within 5 % ([M] Lai & Nazaroff 2000 Table 3 as tabulated in public code; not checked against the paper)', () => {
    expect(Math.abs(depositionVelocities(1e-9, 1000, U_STAR).integral / 29.1 - 1)).toBeLessThan(0.05);
    expect(Math.abs(depositionVelocities(1e-8, 1000, U_STAR).integral / 579.3 - 1)).toBeLessThan(0.05);
  });
});

describe('depositionVelocities (Lai & Nazaroff 2000, u* = 1 cm/s, unit density)', () => {
  const at = (d_m: number) => depositionVelocities(d_m, 1000, U_STAR);

  it('is Brownian-dominated below 0.1 µm: all orientations agree, and v_dv ∝ u* ([S] physics.md §11)', () => {
    for (const d_m of [1e-9, 1e-8, 3e-8]) {
      const v = at(d_m);
      expect(Math.abs(v.upward_mPerS / v.vertical_mPerS - 1)).toBeLessThan(0.05);
      expect(Math.abs(v.downward_mPerS / v.vertical_mPerS - 1)).toBeLessThan(0.05);
      expect(depositionVelocities(d_m, 1000, 2 * U_STAR).vertical_mPerS / v.vertical_mPerS).toBeCloseTo(2, 2);
    }
  });

  it('gives about 3e-4 m/s at 1 nm and 2e-5 m/s at 10 nm on a wall, from I ≈ 29 and 580 ([M] Lai & Nazaroff 2000 Table 3)', () => {
    expect(at(1e-9).vertical_mPerS).toBeGreaterThan(2.5e-4);
    expect(at(1e-9).vertical_mPerS).toBeLessThan(4.5e-4);
    expect(at(1e-8).vertical_mPerS).toBeGreaterThan(1.2e-5);
    expect(at(1e-8).vertical_mPerS).toBeLessThan(2.5e-5);
  });

  it('falls on a smooth wall as the particle grows from 1 nm to 10 µm (the model has no inertial rise at u* = 1 cm/s)', () => {
    let previous = Infinity;
    for (let e = -9; e <= -5; e += 0.25) {
      const v = at(10 ** e).vertical_mPerS;
      expect(v).toBeLessThan(previous);
      previous = v;
    }
  });

  it('is settling-dominated on the floor above 1 µm and tends to V_TS, while ceilings collect almost nothing ([S] physics.md §11)', () => {
    for (const d_m of [2e-6, 1e-5, 1e-4]) {
      const v = at(d_m);
      expect(Math.abs(v.upward_mPerS / settlingVelocity(d_m, 1000) - 1)).toBeLessThan(0.01);
      expect(v.downward_mPerS).toBeLessThan(1e-3 * v.vertical_mPerS);
    }
  });

  it('always has v_du − v_dd = v_s exactly, for any size ([C] from the two expressions)', () => {
    for (const d_m of [5e-8, 2e-7, 5e-7]) {
      const v = at(d_m);
      expect((v.upward_mPerS - v.downward_mPerS) / v.settling_mPerS).toBeCloseTo(1, 9);
    }
  });

  it('leaves the room loss rate lowest between 0.1 and 1 µm ([S] physics.md §11; Thatcher et al. 2002)', () => {
    const room = { vertical_m2: 45, upward_m2: 20, downward_m2: 20, volume_m3: 50 };
    let best = { d_m: 0, beta: Infinity };
    for (let e = -9; e <= -4; e += 0.05) {
      const beta = roomDepositionRate(room, at(10 ** e));
      if (beta < best.beta) best = { d_m: 10 ** e, beta };
    }
    expect(best.d_m).toBeGreaterThan(0.1e-6);
    expect(best.d_m).toBeLessThan(1e-6);
  });

  it('rejects a zero friction velocity, naming it', () => {
    expect(() => depositionVelocities(1e-6, 1000, 0)).toThrow(/frictionVelocity_mPerS.*got 0/);
  });
});

describe('roomDepositionRate', () => {
  it('reduces to settling on the floor, V_TS/H, for large particles ([P] physics.md §9 well-mixed settling loss)', () => {
    const room = { vertical_m2: 2 * (4 + 5) * 2.5, upward_m2: 20, downward_m2: 20, volume_m3: 50 };
    const v = depositionVelocities(5e-5, 1000, U_STAR);
    expect(roomDepositionRate(room, v) / (v.settling_mPerS / 2.5)).toBeCloseTo(1, 3);
  });

  it('sums v·A over the three orientations and divides by V ([S] Lai & Nazaroff 2000)', () => {
    const v = { vertical_mPerS: 1e-5, upward_mPerS: 3e-5, downward_mPerS: 2e-6, settling_mPerS: 2.8e-5, integral: 1000 };
    expect(roomDepositionRate({ vertical_m2: 40, upward_m2: 10, downward_m2: 10, volume_m3: 25 }, v)).toBeCloseTo(
      (1e-5 * 40 + 3e-5 * 10 + 2e-6 * 10) / 25,
      15,
    );
  });
});

// mulberry32, seeded: tests need reproducible noise, never Math.random.
function generator(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('absorptionProbability', () => {
  it('is v_d·√(πΔt/D) and caps at 1 with a flag ([S] Erban & Chapman 2007)', () => {
    expect(absorptionProbability(1e-4, 0.01, 0.1).probability).toBeCloseTo(1e-4 * Math.sqrt((Math.PI * 0.1) / 0.01), 15);
    expect(absorptionProbability(3, 0.01, 0.1)).toEqual({ probability: 1, capped: true });
  });

  it('makes a seeded 1-D walk lose mass as a slab whose face absorbs κ·C ([M] Carslaw & Jaeger radiation-boundary series)', () => {
    const diffusivity = 1;
    const kappa = 0.3;
    const dt = 2e-4;
    const steps = 2500;
    const n = 5000;
    const random = generator(7);
    const p = absorptionProbability(kappa, diffusivity, dt).probability;
    const sigma = Math.sqrt(2 * diffusivity * dt);
    let absorbed = 0;
    for (let k = 0; k < n; k++) {
      let x = random();
      for (let s = 0; s < steps; s++) {
        const g = Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
        x += sigma * g;
        if (x > 1) x = 2 - x;
        if (x < 0) {
          if (random() < p) {
            absorbed++;
            break;
          }
          x = -x;
        }
      }
    }
    // Slab insulated at x = 1, radiating at x = 0 (Carslaw & Jaeger §3.10, from memory):
    // M(t)/M₀ = Σ 2h²/(βₙ²(βₙ² + h² + h))·exp(−βₙ²Dt), βₙ·tan βₙ = h = κL/D.
    let remaining = 0;
    for (let k = 0; k < 200; k++) {
      const lo = k * Math.PI + 1e-12;
      const b = bisect((x) => x * Math.sin(x) - kappa * Math.cos(x), lo, lo + Math.PI / 2 - 2e-12);
      remaining += ((2 * kappa * kappa) / (b * b * (b * b + kappa * kappa + kappa))) * Math.exp(-b * b * diffusivity * steps * dt);
    }
    const expected = 1 - remaining;
    const se = Math.sqrt((expected * (1 - expected)) / n);
    expect(Math.abs(absorbed / n - expected)).toBeLessThan(4 * se);
    expect(absorbed / n).toBeGreaterThan(0.1);
  });
});
