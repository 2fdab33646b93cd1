import { formatSig } from '../format/index';
import { type ExposureRating, exposureRatingCategory } from '../physics/exposure';
import { requirePositive } from '../physics/validate';
import type { Banner, Fraction } from '../vocabulary/fractions';
import { DEFAULT_DAY_TO_DAY_GSD, dailyP95 } from './day-to-day';
import { checkZoneHistories } from './zone-histories';

/** How the hood's speed at the source compares with the range for the source's release type. */
export type CaptureVelocityVerdict = 'below-half' | 'below' | 'within' | 'above';

/** The stored numbers of one run for the limit's fraction. */
export interface RunNumbers {
  twa8h_mgPerM3: number;
  twa8hCi95_mgPerM3: readonly [number, number];
  /** Histories that reached the breathing zone for this fraction; undefined when unknown. */
  zoneHistories?: number;
  /** Simulated source histories in the run (particles over all batches). */
  histories: number;
  /** Peak 15-min average and its interval (absent in results that predate it). */
  peak15min_mgPerM3?: number;
  peak15minCi95_mgPerM3?: readonly [number, number];
}

export interface JudgeLimit {
  fraction: Fraction;
  value_mgPerM3: number;
  /** The agent's 15-min short-term limit, where one exists. */
  shortTerm_mgPerM3?: number;
}

/** The peak 15-min average against the short-term limit: 'maybe' when its interval reaches either side. */
export interface ShortTermVerdict {
  value_mgPerM3: number;
  percentOfLimit: number;
  percentOfLimitUpper: number;
  exceeds: 'no' | 'maybe' | 'yes';
}

export interface JudgeOptions {
  /** Day-to-day GSD of daily 8-h exposures; DEFAULT_DAY_TO_DAY_GSD when absent. */
  gsd?: number;
  captureVelocity?: CaptureVelocityVerdict;
  /** Set for a downdraft bench, whose speed is its face velocity over the work surface; absent for the centre-line check. */
  captureBasis?: 'face-velocity';
}

export interface Verdict {
  fraction: Fraction;
  value_mgPerM3: number;
  percentOfLimit: number;
  percentOfLimitUpper: number;
  /** 95th percentile of daily exposures from the interval's upper bound, mg/m³. */
  p95_mgPerM3: number;
  ratingCategory: ExposureRating;
  banner: Banner;
  /** False while more particles could still change the banner. */
  decided: boolean;
  reasons: string[];
  /** Further particles estimated to reach a decision at the current rate; null when no estimate can be made. */
  moreHistories: number | null;
  gsd: number;
  shortTerm?: ShortTermVerdict;
}

// Half the limit is the action level (29 CFR 1910.1053); the bands are on the daily 95th percentile.
function band(p95_mgPerM3: number, limit_mgPerM3: number): Banner {
  if (p95_mgPerM3 < 0.5 * limit_mgPerM3) return 'clear';
  return p95_mgPerM3 <= limit_mgPerM3 ? 'watch' : 'act';
}

const pct = (fraction: number) => `${formatSig(100 * fraction, 2)} %`;

/** The stored interval, made safe to judge: a bound on the wrong side of the mean, or not a number, is not trusted. */
function cleanInterval(n: RunNumbers): { mean: number; lo: number; hi: number; sound: boolean } {
  const mean = Number.isFinite(n.twa8h_mgPerM3) && n.twa8h_mgPerM3 > 0 ? n.twa8h_mgPerM3 : 0;
  const [lo, hi] = n.twa8hCi95_mgPerM3;
  const sound = Number.isFinite(lo) && Number.isFinite(hi) && lo <= mean && hi >= mean && n.twa8h_mgPerM3 >= 0;
  return { mean, lo: sound && lo > 0 ? lo : 0, hi: sound ? hi : Math.max(mean, Number.isFinite(hi) ? hi : 0), sound };
}

// The interval's half-width shrinks as 1/√N: the particles that bring one bound to the threshold.
function moreToSettle(histories: number, mean: number, halfWidth: number, thresholdMean: number): number | null {
  const gap = Math.abs(mean - thresholdMean);
  if (!(gap > 0) || !(halfWidth > 0) || !(histories > 0)) return null;
  return Math.max(0, Math.ceil(histories * ((halfWidth / gap) * (halfWidth / gap) - 1)));
}

// A peak above the short-term limit is a finding of its own; a peak whose interval straddles it keeps the banner from Clear.
function judgeShortTerm(numbers: RunNumbers, shortTerm_mgPerM3: number | undefined): ShortTermVerdict | undefined {
  const peak = numbers.peak15min_mgPerM3;
  if (!(shortTerm_mgPerM3 !== undefined && shortTerm_mgPerM3 > 0) || peak === undefined || !Number.isFinite(peak)) return undefined;
  const [lo, hi] = numbers.peak15minCi95_mgPerM3 ?? [peak, peak];
  const sound = Number.isFinite(lo) && Number.isFinite(hi) && lo <= peak && hi >= peak;
  const upper = sound ? hi : Math.max(peak, Number.isFinite(hi) ? hi : peak);
  const lower = sound ? lo : 0;
  const exceeds = lower > shortTerm_mgPerM3 ? 'yes' : upper > shortTerm_mgPerM3 ? 'maybe' : 'no';
  return {
    value_mgPerM3: shortTerm_mgPerM3,
    percentOfLimit: (100 * peak) / shortTerm_mgPerM3,
    percentOfLimitUpper: (100 * upper) / shortTerm_mgPerM3,
    exceeds,
  };
}

/**
 * The verdict on one run against a limit: the rating and the banner judge the daily 95th percentile
 * from the interval's upper bound, and any doubt (too few zone histories, an interval across a
 * threshold, a hood too slow at the source) keeps the banner from Clear.
 */
export function judgeRun(numbers: RunNumbers, limit: JudgeLimit, options: JudgeOptions = {}): Verdict {
  const limit_mgPerM3 = requirePositive('limit.value_mgPerM3', limit.value_mgPerM3);
  const gsd = options.gsd ?? DEFAULT_DAY_TO_DAY_GSD;
  const { mean, lo, hi, sound } = cleanInterval(numbers);
  const p95 = dailyP95(hi, gsd);
  const p95Lo = dailyP95(lo, gsd);
  const computed = band(p95, limit_mgPerM3);
  const reasons: string[] = [];
  let decided = true;
  let moreHistories: number | null = 0;

  if (!sound) {
    reasons.push('The stored interval does not contain its own mean, so it cannot be trusted: run the scenario again.');
    decided = false;
    moreHistories = null;
  }
  const histories = checkZoneHistories(numbers.zoneHistories, numbers.histories);
  if (histories.reason) {
    reasons.push(histories.reason);
    decided = false;
    moreHistories = histories.moreHistories;
  } else if (sound && !(hi > lo)) {
    reasons.push('The interval has no width, which says nothing about the error: run more particles before deciding.');
    decided = false;
    moreHistories = null;
  } else if (sound) {
    // Only a threshold whose two sides give different banners needs deciding: with the hood below half its
    // capture velocity Clear reads Watch anyway, so half the limit no longer matters and only the limit does.
    const capped = options.captureVelocity === 'below-half';
    for (const threshold of capped ? [limit_mgPerM3] : [0.5 * limit_mgPerM3, limit_mgPerM3]) {
      if (p95Lo < threshold && p95 >= threshold) {
        const what = threshold < limit_mgPerM3 ? 'half the limit (the action level)' : 'the limit';
        reasons.push(
          `Not enough particles to decide: the daily 95th percentile lies between ${pct(p95Lo / limit_mgPerM3)} and ${pct(p95 / limit_mgPerM3)} of the limit, on both sides of ${what}.`,
        );
        decided = false;
        const needed = moreToSettle(numbers.histories, mean, hi - mean, (threshold * hi) / p95);
        moreHistories = moreHistories === null || needed === null ? null : Math.max(moreHistories, needed);
      }
    }
  }
  const shortTerm = judgeShortTerm(numbers, limit.shortTerm_mgPerM3);
  if (shortTerm?.exceeds === 'yes')
    reasons.push(
      `The peak 15-min average is above the short-term limit: ${pct(shortTerm.percentOfLimit / 100)} of ${formatSig(shortTerm.value_mgPerM3, 3)} mg/m³.`,
    );
  if (shortTerm?.exceeds === 'maybe') {
    reasons.push(
      `Not enough particles to decide the peak: its interval reaches ${pct(shortTerm.percentOfLimitUpper / 100)} of the 15-min short-term limit.`,
    );
    decided = false;
    moreHistories = null;
  }
  if (options.captureVelocity === 'below-half') {
    reasons.push(
      options.captureBasis === 'face-velocity'
        ? "The bench's face velocity is below half the lower end of the downdraft-bench guidance, or the source is not over its work surface: confirm by measurement before relying on the result."
        : "The hood's speed at the source is below half the lower end of the range for this release: confirm by measurement before relying on the result.",
    );
  }
  const guarded = !decided || options.captureVelocity === 'below-half';
  const banner = shortTerm?.exceeds === 'yes' ? 'act' : guarded && computed === 'clear' ? 'watch' : computed;
  return {
    fraction: limit.fraction,
    value_mgPerM3: limit_mgPerM3,
    percentOfLimit: (100 * mean) / limit_mgPerM3,
    percentOfLimitUpper: (100 * hi) / limit_mgPerM3,
    p95_mgPerM3: p95,
    ratingCategory: exposureRatingCategory(p95 / limit_mgPerM3),
    banner,
    decided,
    reasons,
    moreHistories: decided ? 0 : moreHistories,
    gsd,
    ...(shortTerm ? { shortTerm } : {}),
  };
}
