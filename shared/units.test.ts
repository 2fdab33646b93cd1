import { describe, it, expect } from 'vitest';
import * as units from './units';

describe('length conversions', () => {
  it('turns 2.5 µm into 2.5e-6 m and back', () => {
    expect(units.micrometresToMetres(2.5)).toBeCloseTo(2.5e-6, 18);
    expect(units.metresToMicrometres(2.5e-6)).toBeCloseTo(2.5, 12);
  });

  it('turns 50 nm into 5e-8 m and back', () => {
    expect(units.nanometresToMetres(50)).toBeCloseTo(5e-8, 20);
    expect(units.metresToNanometres(5e-8)).toBeCloseTo(50, 10);
  });

  it('turns 300 mm into 0.3 m and back', () => {
    expect(units.millimetresToMetres(300)).toBeCloseTo(0.3, 14);
    expect(units.metresToMillimetres(0.3)).toBeCloseTo(300, 10);
  });
});

describe('airflow and time conversions', () => {
  it('turns 1800 m³/h into 0.5 m³/s and back', () => {
    expect(units.cubicMetresPerHourToPerSecond(1800)).toBe(0.5);
    expect(units.cubicMetresPerSecondToPerHour(0.5)).toBe(1800);
  });

  it('turns 90 s into 1.5 min and 2 h into 7200 s', () => {
    expect(units.secondsToMinutes(90)).toBe(1.5);
    expect(units.minutesToSeconds(1.5)).toBe(90);
    expect(units.hoursToSeconds(2)).toBe(7200);
    expect(units.secondsToHours(7200)).toBe(2);
  });
});

describe('mass and concentration conversions', () => {
  it('turns 0.025 mg/m³ into 25 µg/m³ and back', () => {
    expect(units.mgPerM3ToUgPerM3(0.025)).toBeCloseTo(25, 12);
    expect(units.ugPerM3ToMgPerM3(25)).toBeCloseTo(0.025, 15);
  });

  it('turns milligrams into micrograms and back', () => {
    expect(units.milligramsToMicrograms(1.5)).toBe(1500);
    expect(units.microgramsToMilligrams(1500)).toBeCloseTo(1.5, 14);
  });

  it('turns a release rate of 6 mg/min into 0.1 mg/s and 360 mg/h', () => {
    expect(units.mgPerMinToMgPerS(6)).toBeCloseTo(0.1, 15);
    expect(units.mgPerSToMgPerMin(0.1)).toBeCloseTo(6, 13);
    expect(units.mgPerSToMgPerH(0.1)).toBeCloseTo(360, 10);
    expect(units.mgPerHToMgPerS(360)).toBeCloseTo(0.1, 15);
  });
});

describe('temperature and pressure conversions', () => {
  it('turns 20 °C into 293.15 K and back', () => {
    expect(units.celsiusToKelvin(20)).toBeCloseTo(293.15, 12);
    expect(units.kelvinToCelsius(293.15)).toBeCloseTo(20, 12);
  });

  it('turns 101.325 kPa into 101325 Pa and back', () => {
    expect(units.kilopascalsToPascals(101.325)).toBeCloseTo(101325, 8);
    expect(units.pascalsToKilopascals(101325)).toBeCloseTo(101.325, 12);
  });
});
