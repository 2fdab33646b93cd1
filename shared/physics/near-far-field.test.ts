import { describe, it, expect } from 'vitest';
import { nearFieldFarField } from './index';
import { integrateRk4 } from './rk4.test-helper';

const model = {
  generation_mgPerS: 0.5,
  airflow_m3PerS: 0.2,
  nearFieldVolume_m3: 8,
  farFieldVolume_m3: 150,
  interzonalAirflow_m3PerS: 1.5,
};

function twoZoneDerivative(k: number) {
  return ([cN, cF]: number[]) => [
    (model.generation_mgPerS + model.interzonalAirflow_m3PerS * (cF - cN)) / model.nearFieldVolume_m3 - k * cN,
    (model.interzonalAirflow_m3PerS * (cN - cF) - model.airflow_m3PerS * cF) / model.farFieldVolume_m3 - k * cF,
  ];
}

describe('nearFieldFarField', () => {
  it('reaches C_F = G/Q and C_N = G/Q + G/β at steady state ([S] Nicas 1996; Keil et al. 2009)', () => {
    const steady = nearFieldFarField(model, Infinity);
    expect(steady.far_mgPerM3).toBeCloseTo(0.5 / 0.2, 12);
    expect(steady.near_mgPerM3).toBeCloseTo(0.5 / 0.2 + 0.5 / 1.5, 12);
  });

  it('starts from zero in both zones', () => {
    const start = nearFieldFarField(model, 0);
    expect(Math.abs(start.near_mgPerM3)).toBeLessThan(1e-12);
    expect(Math.abs(start.far_mgPerM3)).toBeLessThan(1e-12);
  });

  it.each([0, 5e-4])('matches RK4 integration of the two-zone equations with loss rate %s per second', (k) => {
    for (const time_s of [60, 900, 7200]) {
      const [near, far] = integrateRk4(twoZoneDerivative(k), [0, 0], time_s, 4000);
      const analytic = nearFieldFarField({ ...model, lossRate_perS: k }, time_s);
      expect(Math.abs(analytic.near_mgPerM3 / near - 1)).toBeLessThan(1e-8);
      expect(Math.abs(analytic.far_mgPerM3 / far - 1)).toBeLessThan(1e-8);
    }
  });

  it('keeps the near field above the far field at every time', () => {
    for (const time_s of [1, 30, 600, 36000]) {
      const c = nearFieldFarField(model, time_s);
      expect(c.near_mgPerM3).toBeGreaterThan(c.far_mgPerM3);
    }
  });

  it('rejects a room with neither ventilation nor loss, and a zero interzonal airflow', () => {
    expect(() => nearFieldFarField({ ...model, airflow_m3PerS: 0 }, 10)).toThrow(/airflow_m3PerS or lossRate_perS/);
    expect(() => nearFieldFarField({ ...model, interzonalAirflow_m3PerS: 0 }, 10)).toThrow(/interzonalAirflow_m3PerS.*got 0/);
  });
});
