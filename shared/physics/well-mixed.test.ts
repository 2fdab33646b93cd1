import { describe, it, expect } from 'vitest';
import { airChangesPerHour, settlingLossRate, settlingVelocity, wellMixedConcentration } from './index';
import { integrateRk4 } from './rk4.test-helper';

const room = { generation_mgPerS: 0.2, airflow_m3PerS: 0.1, volume_m3: 60, lossRate_perS: 2e-4, initial_mgPerM3: 3 };

describe('wellMixedConcentration', () => {
  it('reaches G/(Q + kV) at steady state (common practice)', () => {
    expect(wellMixedConcentration(room, Infinity)).toBeCloseTo(0.2 / (0.1 + 2e-4 * 60), 12);
  });

  it('starts at the initial concentration', () => {
    expect(wellMixedConcentration(room, 0)).toBe(3);
  });

  it('matches RK4 integration of V·dC/dt = G − (Q + kV)·C at 5, 20 and 60 minutes', () => {
    const derivative = ([c]: number[]) => [
      (room.generation_mgPerS - (room.airflow_m3PerS + room.lossRate_perS * room.volume_m3) * c) / room.volume_m3,
    ];
    for (const time_s of [300, 1200, 3600]) {
      const [numeric] = integrateRk4(derivative, [room.initial_mgPerM3], time_s, 2000);
      expect(Math.abs(wellMixedConcentration(room, time_s) / numeric - 1)).toBeLessThan(1e-9);
    }
  });

  it('grows linearly in a sealed room without losses', () => {
    const sealed = { generation_mgPerS: 0.6, airflow_m3PerS: 0, volume_m3: 30 };
    expect(wellMixedConcentration(sealed, 100)).toBeCloseTo(2, 12);
  });

  it('rejects a zero volume and a negative time, naming the argument', () => {
    expect(() => wellMixedConcentration({ ...room, volume_m3: 0 }, 10)).toThrow(/volume_m3.*got 0/);
    expect(() => wellMixedConcentration(room, -10)).toThrow(/time_s.*-10/);
  });
});

describe('room helpers', () => {
  it('gives ACH = 3600·Q/V: 0.1 m³/s in 60 m³ is 6 per hour', () => {
    expect(airChangesPerHour(0.1, 60)).toBeCloseTo(6, 12);
  });

  it('gives a settling loss rate V_TS/H: a 10 µm unit-density particle in a 3 m room loses about 1e-3 per second', () => {
    const k = settlingLossRate(settlingVelocity(10e-6, 1000), 3);
    expect(k).toBeGreaterThan(0.9e-3);
    expect(k).toBeLessThan(1.1e-3);
  });
});
