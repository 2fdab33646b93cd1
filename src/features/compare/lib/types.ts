import type { CaptureVerdictWord } from '../../../../shared/physics/capture-verdict';
import type { Banner, ExposureRating } from '../../../../shared/physics/index';
import type { ControlTier } from '../../../../shared/schemas/workspace';
import type { Fate, Fraction } from '../../../../shared/vocabulary/fractions';

export type Ci = [number, number];

/** The parts of a stored run that side by side reads, regrouped from the run's result by the compare route. */
export interface RunFigures {
  fractions: Record<Fraction, { twa8h_mgPerM3: number; twa8hCi95_mgPerM3: Ci; peak15min_mgPerM3: number }>;
  series: { time_s: number[]; bands: Record<Fraction, { mean: number[]; lo: number[]; hi: number[] }> };
  fate: { emitted_mg: number; shares: Record<Fate, number> };
  limit?: {
    fraction: Fraction;
    value_mgPerM3: number;
    percentOfLimit: number;
    percentOfLimitUpper: number;
    ratingCategory: ExposureRating;
    banner: Banner;
    /** The verdict's daily 95th percentile (from the interval's upper bound) and whether the run has decided (shared/verdict). */
    p95_mgPerM3?: number;
    decided?: boolean;
    reasons?: string[];
  };
  /** Words for the rating category, supplied by whoever computed the figures. */
  ratingName?: string;
}

export interface HoodFigures {
  name?: string;
  kind: string;
  airflow_m3PerS: number;
  faceWidth_m: number;
  faceHeight_m: number;
}

export interface CompareColumn {
  id: number;
  name: string;
  workstationName: string;
  siteName: string;
  controlTier: ControlTier;
  controlDescription: string;
  hoods: HoodFigures[];
  totalAirflow_m3PerS: number;
  /** The hand-calculated capture speed at the source against the release type's range, in words; null without a hood. */
  capture?: string | null;
  /** The same check as one word; "below-half" keeps the verdict from Clear. */
  captureVelocity?: CaptureVerdictWord | null;
  run: (RunFigures & { id: number; createdAt: string; outOfDate: boolean }) | null;
}

/** The three health-related fractions the table reports, finest first. */
export const TABLE_FRACTIONS = ['respirable', 'thoracic', 'inhalable'] as const satisfies readonly Fraction[];
