import { hoodAxis } from '../schemas/hood-axis';
import { formatSig } from '../format/index';
import { RELEASE_TYPE_NEEDS } from '../vocabulary/release-types';
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

export interface CaptureCheck {
  speedAtSource_mPerS: number;
  range: CaptureVelocityRange;
  verdict: CaptureVerdictWord;
  sentence: string;
  hoodIndex: number;
  /** The source sits behind the face, where the centre-line equation says nothing: counted as no speed. */
  behind: boolean;
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

/** The hood that draws fastest at the source against the release type's capture range (ACGIH table), in words. */
export function captureCheck(scenario: {
  source: Point & { releaseType?: ReleaseCondition };
  hoods: readonly CaptureHood[];
}): CaptureCheck | null {
  const release = scenario.source.releaseType;
  if (!release || scenario.hoods.length === 0) return null;
  const speeds = scenario.hoods.map((h) => speedAtSource(h, scenario.source));
  const hoodIndex = speeds.reduce((best, s, i) => (s.speed_mPerS > speeds[best].speed_mPerS ? i : best), 0);
  const { speed_mPerS, behind } = speeds[hoodIndex];
  const range = captureVelocityRange(release);
  const verdict = captureVerdictWord(speed_mPerS, range);
  const at = behind
    ? 'The source is behind the hood face, so no capture speed reaches it'
    : `${formatSig(speed_mPerS, 2)} m/s at the source`;
  const sentence = `${at}; ${RELEASE_TYPE_NEEDS[release]} needs ${formatSig(range.min_mPerS, 2)}–${formatSig(range.max_mPerS, 2)} m/s (${WORDS[verdict]}).`;
  return { speedAtSource_mPerS: speed_mPerS, range, verdict, sentence, hoodIndex, behind };
}
