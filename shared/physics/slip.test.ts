import { describe, it, expect } from 'vitest';
import { ALLEN_RAABE_SLIP, airProperties, slipCorrection } from './index';

// [S] Hinds, Aerosol Technology 2nd ed., App. A11; tolerance 0.5 %.
const HINDS_A11: [number, number][] = [
  [0.001, 224.332],
  [0.01, 22.976],
  [0.1, 2.928],
  [1, 1.155],
  [10, 1.015],
  [100, 1.002],
];

describe('slipCorrection', () => {
  it.each(HINDS_A11)('gives Cc(%s µm) = %s within 0.5 % ([S] Hinds App. A11)', (d_um, expected) => {
    expect(Math.abs(slipCorrection(d_um * 1e-6) / expected - 1)).toBeLessThan(0.005);
  });

  it('pairs the Allen & Raabe coefficients with their own λ of 0.0673 µm at 23 °C (coefficients [S], λ from memory)', () => {
    const at23C = airProperties({ temperature_K: 296.15, pressure_Pa: 101325 });
    const kn = (2 * 0.0673e-6) / 0.1e-6;
    const expected = 1 + kn * (1.142 + 0.558 * Math.exp(-0.999 / kn));
    expect(slipCorrection(0.1e-6, at23C, ALLEN_RAABE_SLIP)).toBeCloseTo(expected, 10);
  });

  it('agrees with Hinds Eq. 3.20 within 2.5 % at 0.1 µm when each uses its own λ', () => {
    const ratio = slipCorrection(0.1e-6, undefined, ALLEN_RAABE_SLIP) / slipCorrection(0.1e-6);
    expect(Math.abs(ratio - 1)).toBeLessThan(0.025);
  });

  it('grows at low pressure, where the gas is more rarefied', () => {
    const thin = airProperties({ temperature_K: 293.15, pressure_Pa: 50000 });
    expect(slipCorrection(0.5e-6, thin)).toBeGreaterThan(slipCorrection(0.5e-6));
  });

  it('rejects a negative or NaN diameter, naming the argument and quoting the value', () => {
    expect(() => slipCorrection(-1e-6)).toThrow(/diameter_m.*-0.000001/);
    expect(() => slipCorrection(NaN)).toThrow(/diameter_m.*NaN/);
    expect(() => slipCorrection(0)).toThrow(RangeError);
  });
});
