import type { Scenario } from '../schemas/scenario';
import type { ProfileData } from './profile';

export type ScenarioSizeProfile = Scenario['dust']['sizeProfile'];

// Uploaded profiles travel as aerodynamic mass bins, lognormal ones as MMAD + GSD, already converted
// with the profile's own density, so the engine shows the same dust the profile page does.
export function toScenarioSizeProfile(stored: Pick<ProfileData, 'kind' | 'bins' | 'fittedMmad_m' | 'fittedGsd'>): ScenarioSizeProfile {
  if ((stored.kind === 'lognormal' || stored.kind === 'respirable') && stored.fittedMmad_m !== null && stored.fittedGsd !== null) {
    return { kind: 'lognormal', basis: 'mmad', median_m: stored.fittedMmad_m, gsd: stored.fittedGsd };
  }
  return {
    kind: 'bins',
    basis: 'mass',
    diameter: 'aerodynamic',
    edges_m: [...stored.bins.edges_m],
    amounts: [...stored.bins.massFraction],
  };
}
