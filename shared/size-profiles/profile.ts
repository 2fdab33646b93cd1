import type { ImpactorStage } from './impactor';
import type { LognormalInput } from './lognormal-input';
import type { MassBins } from './mass-bins';
import type { ConventionFractions } from './bin-fractions';
import type { SizeRange } from './size-ranges';

export const PROFILE_KINDS = ['impactor', 'counter', 'bins', 'lognormal', 'respirable'] as const;
export type ProfileKind = (typeof PROFILE_KINDS)[number];

// What the user gave, kept as given (SI units) so a profile can be rebuilt or audited later.
export type ProfileInput =
  | { kind: 'impactor'; fileName: string; stages: ImpactorStage[] }
  | { kind: 'counter'; fileName: string; density_kgPerM3: number; ranges: SizeRange[] }
  | { kind: 'bins'; fileName: string; ranges: SizeRange[] }
  | ({ kind: 'lognormal' } & LognormalInput)
  | { kind: 'respirable'; respirableFraction: number; gsd: number };

export type ProfileData = {
  kind: ProfileKind;
  input: ProfileInput;
  bins: MassBins;
  fittedMmad_m: number | null;
  fittedGsd: number | null;
  fractions: ConventionFractions;
};
