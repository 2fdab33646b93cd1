import type { ReleaseType as ReleaseCondition } from '../vocabulary/release-types';

export type { ReleaseCondition };

export interface CaptureVelocityRange {
  min_mPerS: number;
  max_mPerS: number;
  description: string;
  examples: readonly string[];
}

// Use the lower end for quiet rooms, low toxicity, intermittent work and large hoods; the upper end otherwise.
const RANGES: Record<ReleaseCondition, CaptureVelocityRange> = {
  quiet: {
    min_mPerS: 0.25,
    max_mPerS: 0.5,
    description: 'Released with practically no velocity into quiet air',
    examples: ['evaporation from tanks', 'degreasing'],
  },
  low: {
    min_mPerS: 0.5,
    max_mPerS: 1.0,
    description: 'Released at low velocity into moderately still air',
    examples: ['container filling', 'slow conveyor transfer', 'welding'],
  },
  active: {
    min_mPerS: 1.0,
    max_mPerS: 2.5,
    description: 'Active generation into a zone of rapid air motion',
    examples: ['barrel filling', 'conveyor loading', 'crushing'],
  },
  high: {
    min_mPerS: 2.5,
    max_mPerS: 10,
    description: 'Released at high initial velocity into a zone of very rapid air motion',
    examples: ['grinding', 'abrasive blasting'],
  },
};

// Capture-velocity ranges from the ACGIH Industrial Ventilation capture-velocity table.
export function captureVelocityRange(release: ReleaseCondition): CaptureVelocityRange {
  if (!Object.hasOwn(RANGES, release)) throw new RangeError(`release must be quiet, low, active or high, got ${String(release)}`);
  const range = RANGES[release];
  return { ...range, examples: [...range.examples] };
}
