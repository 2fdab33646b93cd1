import { conventionMassFraction } from '../physics/index';
import { binFractions } from './bin-fractions';
import { counterToBins, densityIssue, parseCounter } from './counter';
import { fitLognormal } from './fit-lognormal';
import type { UploadFormat } from './formats';
import { impactorToBins, parseImpactor } from './impactor';
import { type Checked, type CsvRecord, byRow, failed, passed } from './issues';
import { type LognormalInput, DEFAULT_RESPIRABLE_GSD, lognormalBins, lognormalMmad, mmadForRespirableFraction } from './lognormal-input';
import type { MassBins } from './mass-bins';
import { parsePlainBins, plainBinsToBins } from './plain-bins';
import type { ProfileData, ProfileInput } from './profile';

function fromBins(input: ProfileInput, bins: MassBins): ProfileData {
  const fit = fitLognormal(bins);
  return { kind: input.kind, input, bins, fittedMmad_m: fit?.mmad_m ?? null, fittedGsd: fit?.gsd ?? null, fractions: binFractions(bins) };
}

function fromLognormal(input: ProfileInput, mmad_m: number, gsd: number): ProfileData {
  const fraction = (c: 'respirable' | 'thoracic' | 'inhalable') => conventionMassFraction(mmad_m, gsd, c);
  const fractions = { respirable: fraction('respirable'), thoracic: fraction('thoracic'), inhalable: fraction('inhalable') };
  return { kind: input.kind, input, bins: lognormalBins(mmad_m, gsd), fittedMmad_m: mmad_m, fittedGsd: gsd, fractions };
}

export type UploadOptions = { fileName: string; density_kgPerM3?: number };

// Never throws on bad content: every problem comes back as a row issue.
export function buildFromUpload(format: UploadFormat, records: CsvRecord[], options: UploadOptions): Checked<ProfileData> {
  const result = buildChecked(format, records, options);
  return result.ok ? result : failed(byRow(result.issues));
}

function buildChecked(format: UploadFormat, records: CsvRecord[], options: UploadOptions): Checked<ProfileData> {
  const { fileName } = options;
  if (format === 'impactor') {
    const stages = parseImpactor(records);
    return stages.ok
      ? passed(fromBins({ kind: 'impactor', fileName, stages: stages.value }, impactorToBins(stages.value)))
      : failed(stages.issues);
  }
  if (format === 'counter') {
    const ranges = parseCounter(records);
    const density = densityIssue(options.density_kgPerM3);
    if (!ranges.ok || density.length) return failed([...density, ...(ranges.ok ? [] : ranges.issues)]);
    const density_kgPerM3 = options.density_kgPerM3!;
    return passed(
      fromBins({ kind: 'counter', fileName, density_kgPerM3, ranges: ranges.value }, counterToBins(ranges.value, density_kgPerM3)),
    );
  }
  const ranges = parsePlainBins(records);
  return ranges.ok
    ? passed(fromBins({ kind: 'bins', fileName, ranges: ranges.value }, plainBinsToBins(ranges.value)))
    : failed(ranges.issues);
}

export type FormInput = ({ kind: 'lognormal' } & LognormalInput) | { kind: 'respirable'; respirableFraction: number; gsd?: number };

export function buildFromForm(input: FormInput): ProfileData {
  if (input.kind === 'lognormal') return fromLognormal(input, lognormalMmad(input), input.gsd);
  const gsd = input.gsd ?? DEFAULT_RESPIRABLE_GSD;
  const stored = { kind: 'respirable' as const, respirableFraction: input.respirableFraction, gsd };
  const data = fromLognormal(stored, mmadForRespirableFraction(input.respirableFraction, gsd), gsd);
  // The user's figure is the fact; the mapped lognormal only supplies the other two fractions.
  return { ...data, fractions: { ...data.fractions, respirable: input.respirableFraction } };
}
