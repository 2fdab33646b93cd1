import { hoodAxis } from '../schemas/hood-axis';
import { formatSig } from '../format/index';
import { RELEASE_TYPE_NEEDS } from '../vocabulary/release-types';
import { BENCH_FACE_VELOCITY, BENCH_REACH_ABOVE_m, benchFaceCheck } from './bench-face-velocity';
import { captureVelocityRange, type CaptureVelocityRange, type ReleaseCondition } from './capture-velocity';
import { hoodCenterlineVelocity, type HoodKind } from './hoods';

type Point = { x_m: number; y_m: number; z_m: number };
type Direction = { x: number; y: number; z: number } | { azimuth_deg: number; elevation_deg?: number };
export type CaptureHood = Point & {
  kind: HoodKind;
  direction: Direction;
  faceWidth_m: number;
  faceHeight_m: number;
  airflow_m3PerS: number;
};

export type CaptureVerdictWord = 'below-half' | 'below' | 'within' | 'above';
/** How the speed is found: the centre-line equation at the source, or a downdraft bench's face velocity over its work surface. */
export type CaptureBasis = 'centre-line' | 'face-velocity';

export interface CaptureCheck {
  /** Centre-line speed at the source; for a downdraft bench its face velocity Q/A over the work surface. */
  speedAtSource_mPerS: number;
  range: CaptureVelocityRange;
  verdict: CaptureVerdictWord;
  sentence: string;
  hoodIndex: number;
  /** The source sits behind the face, where the centre-line equation says nothing: counted as no speed. */
  behind: boolean;
  basis: CaptureBasis;
  /** A downdraft bench the source is not over (outside its outline, or below or too far above it): counted as no speed. */
  offSurface: boolean;
}

// Half a percent of slack so a hood sized to exactly the low end is not called "below" by rounding.
const SLACK = 0.005;

const WORDS: Record<CaptureVerdictWord, string> = {
  'below-half': 'less than half the low end',
  below: 'below the range',
  within: 'within the range',
  above: 'above the range',
};

export function captureVerdictWord(speed_mPerS: number, range: CaptureVelocityRange): CaptureVerdictWord {
  if (speed_mPerS < 0.5 * range.min_mPerS * (1 - SLACK)) return 'below-half';
  if (speed_mPerS < range.min_mPerS * (1 - SLACK)) return 'below';
  return speed_mPerS > range.max_mPerS * (1 + SLACK) ? 'above' : 'within';
}

// Hand calculation on the hood's axis: the source's distance along it, the published centre-line equation there.
function speedAtSource(hood: CaptureHood, source: Point): { speed_mPerS: number; behind: boolean } {
  const [nx, ny, nz] = hoodAxis(hood.direction);
  const axial_m = (source.x_m - hood.x_m) * nx + (source.y_m - hood.y_m) * ny + (source.z_m - hood.z_m) * nz;
  if (axial_m < 0) return { speed_mPerS: 0, behind: true };
  const geometry = {
    kind: hood.kind,
    faceArea_m2: hood.faceWidth_m * hood.faceHeight_m,
    slotLength_m: hood.faceWidth_m,
    airflow_m3PerS: hood.airflow_m3PerS,
  };
  return { speed_mPerS: hoodCenterlineVelocity(geometry, axial_m), behind: false };
}

type Candidate = { speed_mPerS: number; range: CaptureVelocityRange; behind: boolean; offSurface: boolean; basis: CaptureBasis };

// A bench is judged by its own guidance whatever the release; any other hood needs the release type for its range.
function candidate(hood: CaptureHood, source: Point, release: ReleaseCondition | undefined): Candidate | null {
  if (hood.kind === 'downdraft-bench') {
    const bench = benchFaceCheck(hood, source);
    const speed_mPerS = bench.overSurface ? bench.faceVelocity_mPerS : 0;
    const range = { ...BENCH_FACE_VELOCITY, examples: [...BENCH_FACE_VELOCITY.examples] };
    return { speed_mPerS, range, behind: false, offSurface: !bench.overSurface, basis: 'face-velocity' };
  }
  if (!release) return null;
  return { ...speedAtSource(hood, source), range: captureVelocityRange(release), offSurface: false, basis: 'centre-line' };
}

// On one range the faster hood wins, as it always has; across ranges, the larger share of its own low end.
const better = (c: Candidate, than: Candidate) =>
  c.range.min_mPerS === than.range.min_mPerS
    ? c.speed_mPerS > than.speed_mPerS
    : c.speed_mPerS / c.range.min_mPerS > than.speed_mPerS / than.range.min_mPerS;

const rangeText = (r: CaptureVelocityRange) => `${formatSig(r.min_mPerS, 2)}–${formatSig(r.max_mPerS, 2)} m/s`;

function sentenceFor(c: Candidate, verdict: CaptureVerdictWord, release: ReleaseCondition | undefined): string {
  if (c.basis === 'face-velocity') {
    const at = c.offSurface
      ? `The source is not over the work surface (inside its outline, at most ${formatSig(BENCH_REACH_ABOVE_m, 1)} m above it), so the bench's face-velocity guidance does not apply and counts as no speed`
      : `${formatSig(c.speed_mPerS, 2)} m/s over the work surface`;
    return `${at}; downdraft benches need ${rangeText(c.range)} (common practice; ${WORDS[verdict]}). Confirm against local guidance.`;
  }
  const at = c.behind
    ? 'The source is behind the hood face, so no capture speed reaches it'
    : `${formatSig(c.speed_mPerS, 2)} m/s at the source`;
  return `${at}; ${RELEASE_TYPE_NEEDS[release!]} needs ${rangeText(c.range)} (${WORDS[verdict]}).`;
}

/**
 * The hood that does best at the source, in words: a capturing hood's centre-line speed against the release
 * type's capture range (ACGIH table), a downdraft bench's face velocity against the bench guidance (common practice).
 * Hoods judged on different ranges are compared by their speed over the low end of their own range.
 */
export function captureCheck(scenario: {
  source: Point & { releaseType?: ReleaseCondition };
  hoods: readonly CaptureHood[];
}): CaptureCheck | null {
  const release = scenario.source.releaseType;
  let chosen: Candidate | null = null;
  let hoodIndex = -1;
  for (const [i, hood] of scenario.hoods.entries()) {
    const c = candidate(hood, scenario.source, release);
    if (c && (!chosen || better(c, chosen))) {
      chosen = c;
      hoodIndex = i;
    }
  }
  if (!chosen) return null;
  const verdict = captureVerdictWord(chosen.speed_mPerS, chosen.range);
  return {
    speedAtSource_mPerS: chosen.speed_mPerS,
    range: chosen.range,
    verdict,
    sentence: sentenceFor(chosen, verdict, release),
    hoodIndex,
    behind: chosen.behind,
    basis: chosen.basis,
    offSurface: chosen.offSurface,
  };
}
