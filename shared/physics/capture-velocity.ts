import type { ReleaseType as ReleaseCondition } from '../vocabulary/release-types';

export type { ReleaseCondition };

export interface CaptureVelocityRange {
  min_mPerS: number;
  max_mPerS: number;
  description: string;
  examples: readonly string[];
}

// Use the lower end for quiet rooms, low toxicity, intermittent work and large hoods; the upper end otherwise.
// The speed ranges are the published ones; the descriptions and examples are our own words.
const RANGES: Record<ReleaseCondition, CaptureVelocityRange> = {
  quiet: {
    min_mPerS: 0.25,
    max_mPerS: 0.5,
    description: 'Leaves the source with next to no speed of its own, into still air',
    examples: ['vapour rising off an open tank', 'parts drying after a solvent wash'],
  },
  low: {
    min_mPerS: 0.5,
    max_mPerS: 1.0,
    description: 'Leaves the source gently, into air that barely moves',
    examples: ['scooping powder into a bin', 'a slow belt handing material on', 'welding fume'],
  },
  active: {
    min_mPerS: 1.0,
    max_mPerS: 2.5,
    description: 'Thrown out briskly, into air that moves quickly',
    examples: ['tipping sacks into a hopper', 'the feed point of a loading belt', 'breaking lumps in a crusher'],
  },
  high: {
    min_mPerS: 2.5,
    max_mPerS: 10,
    description: 'Flung out fast, into air that moves very quickly',
    examples: ['grinding', 'blast-cleaning with grit'],
  },
};

// Capture-velocity ranges from the ACGIH Industrial Ventilation capture-velocity table.
export function captureVelocityRange(release: ReleaseCondition): CaptureVelocityRange {
  if (!Object.hasOwn(RANGES, release)) throw new RangeError(`release must be quiet, low, active or high, got ${String(release)}`);
  const range = RANGES[release];
  return { ...range, examples: [...range.examples] };
}
