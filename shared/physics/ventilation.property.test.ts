import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { eddyContinuousSource, hoodCenterlineVelocity, nearFieldFarField, timeWeightedAverage, wellMixedConcentration } from './index';

const positive = (min: number, max: number) => fc.double({ min, max, noNaN: true });
const hoodKind = fc.constantFrom('plain', 'flanged', 'slot', 'flanged-slot');

describe('hood properties', () => {
  it('centre-line velocity falls with distance away from the face', () => {
    fc.assert(
      fc.property(hoodKind, positive(0.01, 1), positive(0.05, 3), positive(0, 2), positive(0, 2), (kind, area, airflow, a, b) => {
        const hood = { kind, faceArea_m2: area, slotLength_m: 1, airflow_m3PerS: airflow };
        fc.pre(Math.abs(a - b) > 1e-6);
        const [near, far] = a < b ? [a, b] : [b, a];
        expect(hoodCenterlineVelocity(hood, far)).toBeLessThanOrEqual(hoodCenterlineVelocity(hood, near));
        expect(hoodCenterlineVelocity(hood, far + 0.5)).toBeLessThan(hoodCenterlineVelocity(hood, near + 0.5));
      }),
    );
  });

  it('centre-line velocity scales with airflow', () => {
    fc.assert(
      fc.property(hoodKind, positive(0.01, 1), positive(0.05, 3), positive(0.1, 10), positive(0, 2), (kind, area, airflow, factor, x) => {
        const hood = { kind, faceArea_m2: area, slotLength_m: 1, airflow_m3PerS: airflow };
        const scaled = hoodCenterlineVelocity({ ...hood, airflow_m3PerS: airflow * factor }, x);
        expect(scaled / hoodCenterlineVelocity(hood, x)).toBeCloseTo(factor, 10);
      }),
    );
  });
});

describe('exposure properties', () => {
  const segments = fc.array(fc.record({ concentration_mgPerM3: positive(0, 20), duration_s: positive(0, 7200) }), { maxLength: 12 });

  it('the time-weighted average is linear in concentration', () => {
    fc.assert(
      fc.property(segments, positive(0, 100), (list, factor) => {
        const scaled = list.map((s) => ({ ...s, concentration_mgPerM3: s.concentration_mgPerM3 * factor }));
        expect(timeWeightedAverage(scaled)).toBeCloseTo(factor * timeWeightedAverage(list), 9);
        const doubled = list.map((s) => ({ ...s, concentration_mgPerM3: s.concentration_mgPerM3 + s.concentration_mgPerM3 * factor }));
        expect(timeWeightedAverage(doubled)).toBeCloseTo(timeWeightedAverage(list) + timeWeightedAverage(scaled), 9);
      }),
    );
  });
});

describe('transient solutions approach their steady states', () => {
  it('the well-mixed room rises monotonically to G/(Q + kV)', () => {
    fc.assert(
      fc.property(positive(0.001, 5), positive(0.01, 5), positive(10, 2000), positive(0, 1e-3), positive(0, 1), (g, q, v, k, a) => {
        const room = { generation_mgPerS: g, airflow_m3PerS: q, volume_m3: v, lossRate_perS: k };
        const steady = wellMixedConcentration(room, Infinity);
        const tau = 1 / (q / v + k);
        expect(wellMixedConcentration(room, a * tau)).toBeLessThanOrEqual(wellMixedConcentration(room, (a + 1) * tau) * (1 + 1e-12));
        expect(Math.abs(wellMixedConcentration(room, 40 * tau) / steady - 1)).toBeLessThan(1e-12);
      }),
    );
  });

  it('the near-field/far-field pair rises to its steady state', () => {
    fc.assert(
      fc.property(positive(0.01, 5), positive(0.01, 5), positive(1, 20), positive(20, 1000), positive(0.1, 10), (g, q, vN, vF, beta) => {
        const model = {
          generation_mgPerS: g,
          airflow_m3PerS: q,
          nearFieldVolume_m3: vN,
          farFieldVolume_m3: vF,
          interzonalAirflow_m3PerS: beta,
        };
        const steady = nearFieldFarField(model, Infinity);
        const early = nearFieldFarField(model, (0.5 * vF) / q);
        const late = nearFieldFarField(model, 100 * (vN + vF) * (1 / q + 1 / beta));
        expect(early.near_mgPerM3).toBeLessThan(steady.near_mgPerM3);
        expect(early.far_mgPerM3).toBeLessThan(steady.far_mgPerM3);
        expect(Math.abs(late.near_mgPerM3 / steady.near_mgPerM3 - 1)).toBeLessThan(1e-9);
        expect(Math.abs(late.far_mgPerM3 / steady.far_mgPerM3 - 1)).toBeLessThan(1e-9);
      }),
    );
  });

  it('the continuous eddy source rises to its steady state', () => {
    fc.assert(
      fc.property(positive(0.001, 1), positive(1e-4, 0.05), positive(0.05, 5), positive(0, 1e-2), (g, d, r, k) => {
        const source = { generation_mgPerS: g, diffusivity_m2PerS: d, lossRate_perS: k };
        const steady = eddyContinuousSource(source, r, Infinity);
        const diffusionTime_s = (r * r) / d;
        expect(eddyContinuousSource(source, r, diffusionTime_s)).toBeLessThanOrEqual(steady * (1 + 1e-12));
        expect(Math.abs(eddyContinuousSource(source, r, 1e8 * diffusionTime_s) / steady - 1)).toBeLessThan(1e-3);
      }),
    );
  });
});
