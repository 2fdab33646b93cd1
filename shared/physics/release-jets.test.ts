import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseScenario } from '../schemas/scenario';
import {
  DEFAULT_JETS,
  JET_REFERENCE_DISTANCE_m,
  defaultJet,
  jetCentrelineSpeed_mPerS,
  resolveJet,
  towardBreathingZone,
  withJetSpeedScaled,
} from './release-jets';

// [S] ACGIH Industrial Ventilation, capture-velocity table (physics.md §8), typed here rather than read from the code.
const TABLE = { low: [0.5, 1.0], active: [1.0, 2.5], high: [2.5, 10] } as const;
// [M] from memory, Hinds App. A4: kinematic viscosity of air at 20 °C, 1.51e-5 m²/s.
const NU_m2PerS = 1.51e-5;

describe('default release jets', () => {
  it('gives quiet releases no jet (common practice)', () => {
    expect(defaultJet('quiet')).toBeNull();
  });

  it('reach the middle of their capture range at 0.3 m, so a hood meeting the range meets the jet (common practice)', () => {
    for (const [release, [min, max]] of Object.entries(TABLE)) {
      const jet = DEFAULT_JETS[release as keyof typeof TABLE]!;
      const u = jetCentrelineSpeed_mPerS(jet.speed_mPerS, jet.diameter_m, JET_REFERENCE_DISTANCE_m);
      expect(u, release).toBeGreaterThanOrEqual(min);
      expect(u, release).toBeLessThanOrEqual(max);
      expect(Math.abs(Math.log(u / Math.sqrt(min * max))), release).toBeLessThan(Math.log(1.05));
    }
  });

  it("rise in speed with the release energy, as the table's ranges do", () => {
    expect(DEFAULT_JETS.low!.speed_mPerS).toBeLessThan(DEFAULT_JETS.active!.speed_mPerS);
    expect(DEFAULT_JETS.active!.speed_mPerS).toBeLessThan(DEFAULT_JETS.high!.speed_mPerS);
  });

  it('are turbulent, Re = u₀d₀/ν above about 2000, so the turbulent round-jet law applies [M]', () => {
    // [M] from memory: a round free jet is turbulent above Re ≈ 2000 (Pope ch. 5 works at Re ≥ 10⁴).
    for (const jet of Object.values(DEFAULT_JETS)) if (jet) expect((jet.speed_mPerS * jet.diameter_m) / NU_m2PerS).toBeGreaterThan(2000);
  });

  it('carry a common-practice tag and a reason each', () => {
    const jets = Object.values(DEFAULT_JETS).filter((j) => j !== null);
    expect(jets).toHaveLength(3);
    for (const jet of jets) {
      expect(jet.tag).toBe('[P]');
      expect(jet.reasoning.length).toBeGreaterThan(30);
    }
  });
});

describe('round jet centre-line', () => {
  it('keeps u₀ in the potential core and falls as 6·u₀·d₀/x beyond it [M] (Pope ch. 5, B = 5.8–6.1)', () => {
    expect(jetCentrelineSpeed_mPerS(10, 0.02, 0.1)).toBe(10);
    // [C] B = 6: 6 × 10 m/s × 0.02 m / 0.6 m = 2 m/s; with B = 5.8 or 6.1 it would be 1.93 or 2.03.
    expect(jetCentrelineSpeed_mPerS(10, 0.02, 0.6)).toBeCloseTo(2, 12);
    expect(jetCentrelineSpeed_mPerS(10, 0.02, 0.6)).toBeGreaterThan(1.93);
    expect(jetCentrelineSpeed_mPerS(10, 0.02, 0.6)).toBeLessThan(2.04);
  });
});

describe('jet direction', () => {
  it('points from the source to the breathing zone as a unit vector: a 3-4-5 triangle [C]', () => {
    const v = towardBreathingZone({ x_m: 1, y_m: 1, z_m: 1 }, { x_m: 1.3, y_m: 1, z_m: 1.4 });
    expect(v[0]).toBeCloseTo(0.6, 12);
    expect(v[1]).toBeCloseTo(0, 12);
    expect(v[2]).toBeCloseTo(0.8, 12);
  });

  it('points up when the worker stands in the source', () => {
    expect(towardBreathingZone({ x_m: 1, y_m: 1, z_m: 1 }, { x_m: 1, y_m: 1, z_m: 1 })).toEqual([0, 0, 1]);
  });
});

describe('the jet a scenario asks for', () => {
  const worker = { x_m: 0, y_m: -0.65, z_m: 0.92 };
  const at = { x_m: 0, y_m: 0, z_m: 0.92 };

  it("falls back to the release type's default, aimed at the breathing zone", () => {
    const jet = resolveJet({ ...at, releaseType: 'high' }, worker)!;
    expect(jet).toMatchObject({ speed_mPerS: 5, diameter_m: 0.05, fromDefault: true });
    expect(jet.direction[1]).toBeCloseTo(-1, 12);
  });

  it("takes the engineer's speed, diameter and direction over the default", () => {
    const jet = resolveJet(
      { ...at, releaseType: 'high', jet: { speed_mPerS: 12, diameter_m: 0.03, direction: { azimuth_deg: 90, elevation_deg: 0 } } },
      worker,
    )!;
    expect(jet).toMatchObject({ speed_mPerS: 12, diameter_m: 0.03, fromDefault: false });
    expect(jet.direction[1]).toBeCloseTo(1, 12);
  });

  it('has none for a quiet release, no release type, or a jet of zero speed', () => {
    expect(resolveJet({ ...at, releaseType: 'quiet' }, worker)).toBeNull();
    expect(resolveJet(at, worker)).toBeNull();
    expect(resolveJet({ ...at, releaseType: 'high', jet: { speed_mPerS: 0, diameter_m: 0.05 } }, worker)).toBeNull();
  });
});

describe("the demo scenarios' releases", () => {
  const dir = new URL('../demo-scenarios/', import.meta.url);
  const demos = readdirSync(dir)
    .filter((f) => f.endsWith('.json'))
    .map((f) => ({ f, s: parseScenario(JSON.parse(readFileSync(new URL(f, dir), 'utf8'))) }));

  it('give grinding a high release and sack tipping and sanding an active one, each with its own jet', () => {
    const expected = { stone: 'high', default: 'high', bakery: 'active', joinery: 'active' } as const;
    expect(demos.length).toBeGreaterThanOrEqual(10);
    for (const { f, s } of demos) {
      expect(s.source.releaseType, f).toBe(expected[f.split('-')[0].replace('.json', '') as keyof typeof expected]);
      expect(s.source.jet, f).toBeDefined();
    }
  });

  it("have jets whose centre-line speed at 0.3 m lies in their release type's capture range (common practice)", () => {
    for (const { f, s } of demos) {
      const [min, max] = TABLE[s.source.releaseType as keyof typeof TABLE];
      const u = jetCentrelineSpeed_mPerS(s.source.jet!.speed_mPerS, s.source.jet!.diameter_m, JET_REFERENCE_DISTANCE_m);
      expect(u, f).toBeGreaterThanOrEqual(min);
      expect(u, f).toBeLessThanOrEqual(max);
    }
  });

  it("let the tipped sack's stream fall and aim grinding at the breathing zone", () => {
    const bakery = demos.find((d) => d.f.startsWith('bakery'))!.s;
    expect(resolveJet(bakery.source, bakery.worker)!.direction).toEqual([0, 0, -1]);
    const stone = demos.find((d) => d.f.startsWith('stone'))!.s;
    expect(stone.source.jet!.direction).toBeUndefined();
  });
});

describe('withJetSpeedScaled', () => {
  const worker = { x_m: 1, y_m: 0, z_m: 1 };
  it('makes the default jet explicit at the scaled speed, same nozzle and direction (for the ±2× sensitivity)', () => {
    const scaled = withJetSpeedScaled({ source: { x_m: 0, y_m: 0, z_m: 1, releaseType: 'high' as const }, worker }, 2);
    expect((scaled.source as { jet?: unknown }).jet).toEqual({ speed_mPerS: 10, diameter_m: 0.05, direction: { x: 1, y: 0, z: 0 } });
  });
  it('leaves a quiet release alone and refuses a factor of zero', () => {
    const quiet = { source: { x_m: 0, y_m: 0, z_m: 1, releaseType: 'quiet' as const }, worker };
    expect(withJetSpeedScaled(quiet, 2)).toBe(quiet);
    expect(() => withJetSpeedScaled(quiet, 0)).toThrow(/factor/);
  });
});
