import { describe, expect, it } from 'vitest';
import { aerodynamicDiameter, conventionMassFraction } from '../physics/index';
import { buildFromForm } from './build-profile';
import { lognormalBins, lognormalMmad, mmadForRespirableFraction } from './lognormal-input';
import { toScenarioSizeProfile } from './to-scenario';

describe('lognormal and respirable-only inputs', () => {
  it('turns a CMD into an MMAD by Hatch–Choate, then into aerodynamic diameter ([S] Hinds Eq. 4.40; §5)', () => {
    const mmad = lognormalMmad({ basis: 'cmd', median_m: 1e-6, gsd: 2, density_kgPerM3: 2650 });
    const physicalMassMedian_m = 1e-6 * Math.exp(3 * Math.log(2) ** 2);
    expect(physicalMassMedian_m * 1e6).toBeCloseTo(4.226, 3);
    expect(mmad).toBeCloseTo(aerodynamicDiameter(physicalMassMedian_m, 2650), 15);
  });

  it('holds all the mass in 40 bins that sum to 1 (analytic)', () => {
    const bins = lognormalBins(5e-6, 2);
    expect(bins.massFraction).toHaveLength(40);
    expect(bins.massFraction.reduce((a, m) => a + m, 0)).toBeCloseTo(1, 12);
  });

  it('finds the GSD-2 lognormal whose respirable fraction is the one given (stated assumption)', () => {
    const mmad = mmadForRespirableFraction(0.25);
    expect(conventionMassFraction(mmad, 2, 'respirable')).toBeCloseTo(0.25, 9);
  });

  it('stores a respirable-only profile with the user’s figure and the mapped lognormal for the rest', () => {
    const data = buildFromForm({ kind: 'respirable', respirableFraction: 0.4 });
    expect(data.fractions.respirable).toBe(0.4);
    expect(data.fittedGsd).toBe(2);
    expect(data.fractions.thoracic).toBeGreaterThan(0.4);
    expect(toScenarioSizeProfile(data)).toEqual({ kind: 'lognormal', basis: 'mmad', median_m: data.fittedMmad_m, gsd: 2 });
  });

  it('sends uploaded profiles to the engine as aerodynamic mass bins', () => {
    const bins = { edges_m: [1e-6, 2e-6, 4e-6], massFraction: [0.25, 0.75] };
    expect(toScenarioSizeProfile({ kind: 'impactor', bins, fittedMmad_m: 2e-6, fittedGsd: 2 })).toEqual({
      kind: 'bins',
      basis: 'mass',
      diameter: 'aerodynamic',
      edges_m: bins.edges_m,
      amounts: bins.massFraction,
    });
  });
});
