import { describe, expect, it } from 'vitest';
import { crossoverDiameter } from './crossover';
import { mediumFor, particleProperties } from './particle-properties';

const medium = (window_s: number, density_kgPerM3 = 1000) =>
  mediumFor({ density_kgPerM3, shapeFactor: 1, temperature_K: 293.15, pressure_Pa: 101325, window_s });

describe('the diameter where settling and Brownian motion move a particle equally far', () => {
  // [M] from memory: over 1 s, unit-density particles settle farther than they diffuse above a few tenths of a µm.
  it('lies between 0.1 and 1 µm for unit density over 1 s (from memory)', () => {
    const d = crossoverDiameter(medium(1))!;
    expect(d).toBeGreaterThan(0.1e-6);
    expect(d).toBeLessThan(1e-6);
  });

  // [C] the definition itself: V·t = √(2Dt) at the root, to 1e-6 relative.
  it.each([1, 60, 3600])('makes settling distance equal rms displacement over %s s to 1e-6 relative ([C] Hinds Eq. 7.18)', (t) => {
    const p = particleProperties(crossoverDiameter(medium(t))!, medium(t));
    expect(Math.abs(p.settlingDistance_m / p.rmsDisplacement_m - 1)).toBeLessThan(1e-6);
  });

  // [C] settling grows as t, Brownian as √t: a longer window lets smaller particles settle farther than they wander.
  it('moves to smaller diameters for longer windows and denser particles', () => {
    expect(crossoverDiameter(medium(60))!).toBeLessThan(crossoverDiameter(medium(1))!);
    expect(crossoverDiameter(medium(1, 2650))!).toBeLessThan(crossoverDiameter(medium(1))!);
  });

  it('returns null when no crossing lies inside the range', () => {
    expect(crossoverDiameter(medium(1), 1e-6, 1e-4)).toBeNull();
  });
});
