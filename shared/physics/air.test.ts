import { describe, it, expect } from 'vitest';
import { airProperties } from './index';

describe('airProperties', () => {
  it('gives dry-air density 1.204 kg/m³ at 20 °C and 1 atm ([C] ideal gas, M = 28.9644 g/mol)', () => {
    expect(airProperties().density_kgPerM3).toBeCloseTo(1.204, 3);
  });

  it('gives viscosity 1.81e-5 Pa·s ([S] Hinds App. A4) and Sutherland 1.8134e-5 ([S] US Std Atmosphere 1976)', () => {
    const { viscosity_PaS } = airProperties();
    expect(Math.abs(viscosity_PaS / 1.81e-5 - 1)).toBeLessThan(0.005);
    expect(Math.abs(viscosity_PaS / 1.8134e-5 - 1)).toBeLessThan(1e-4);
  });

  it('gives mean free path 0.066 µm at 20 °C and 1 atm ([S] Hinds App. A4)', () => {
    expect(airProperties().meanFreePath_m).toBeCloseTo(0.066e-6, 12);
  });

  it('doubles the mean free path when the pressure halves', () => {
    const half = airProperties({ temperature_K: 293.15, pressure_Pa: 101325 / 2 });
    expect(half.meanFreePath_m / 0.066e-6).toBeCloseTo(2, 10);
  });

  it('lengthens the mean free path as (μ/p)·√T when air warms', () => {
    const warm = airProperties({ temperature_K: 313.15, pressure_Pa: 101325 });
    const cool = airProperties();
    const expected = (warm.viscosity_PaS / cool.viscosity_PaS) * Math.sqrt(313.15 / 293.15);
    expect(warm.meanFreePath_m / cool.meanFreePath_m).toBeCloseTo(expected, 12);
    expect(warm.density_kgPerM3).toBeLessThan(cool.density_kgPerM3);
  });

  it('rejects a non-positive temperature, quoting it', () => {
    expect(() => airProperties({ temperature_K: -5, pressure_Pa: 101325 })).toThrow(/temperature_K.*-5/);
    expect(() => airProperties({ temperature_K: 293.15, pressure_Pa: NaN })).toThrow(RangeError);
  });
});
