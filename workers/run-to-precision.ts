import type { RunPrecision } from '../shared/schemas/scenario';
import type { Look, Stopping } from '../shared/schemas/run-result';
import { judgeRun, MIN_ZONE_HISTORIES } from '../shared/verdict/index';
import { summarise } from './engine/combine';
import { type BatchResult, combineBatches, type PreparedScenario, type Results, withBatchTallies } from './engine/index';

/** The first look; later ones double it, so each look re-reads batches 0…N−1 of the same seed stream. */
export const FIRST_LOOK_BATCHES = 20;
/**
 * The batch size a run to a precision starts with (the editor's choice when switching to it, and the bench's): the
 * first look then costs 5,000 particles. Measured with `npm run bench:coverage -- <demo> 250 200 --precision`
 * (200 seeds run to the bench's rule against an 800-batch truth), the look it stopped at put the upper bound below
 * the truth in 0.5 % (joinery side hood, daily 95th percentile near the limit), 1.0 % (bakery flanged hood) and 0.5 %
 * (stone-bench flanged hood) of seeds, under the nominal 2.5 %: the error rate spent over the looks widens the first
 * look enough to cover the skew of small batches, which a single plain 95 % interval of 20 such batches did not (5.0 %).
 */
export const PRECISION_BATCH_PARTICLES = 250;
/** The error rate of the whole sequence of looks, two-sided, as for a fixed run's 95 % interval. */
export const TOTAL_ALPHA = 0.05;

/** Batch counts looked at: 20, 40, 80, … up to maxBatches. */
export function lookPlan(maxBatches: number): number[] {
  const plan: number[] = [];
  for (let n = FIRST_LOOK_BATCHES; n <= maxBatches; n *= 2) plan.push(n);
  return plan.length > 0 ? plan : [FIRST_LOOK_BATCHES];
}

/**
 * The error rate spent at each look: linear in the share of the planned batches read (the
 * Lan–DeMets spending function α·t, from memory), so the spent rates add up to TOTAL_ALPHA and,
 * by the union bound, no sequence of looks can give a false verdict more often than a single
 * look at TOTAL_ALPHA would.
 */
export function lookAlphas(plan: readonly number[], alpha = TOTAL_ALPHA): number[] {
  const last = plan[plan.length - 1];
  return plan.map((n, k) => (alpha * (n - (k > 0 ? plan[k - 1] : 0))) / last);
}

export interface LookOutcome {
  look: Look;
  relativeHalfWidth: number;
  stop: Stopping['reason'] | null;
}

/**
 * One look: the limit fraction's figures over the batches so far at the error rate spent there, and
 * whether it may stop (the verdict is decided, or the interval is narrow enough and rests on enough
 * zone histories). Only that fraction is summarised, so a look costs little beside its batches.
 */
export function lookAt(p: PreparedScenario, batches: readonly BatchResult[], rule: RunPrecision, alpha: number, isLast: boolean) {
  const fraction = p.limit?.fraction ?? 'respirable';
  const { summary: s } = summarise(p, batches, fraction, alpha);
  const [lo, hi] = s.twa8hCi95_mgPerM3;
  const verdict = p.limit
    ? judgeRun(
        {
          twa8h_mgPerM3: s.twa8h_mgPerM3,
          twa8hCi95_mgPerM3: s.twa8hCi95_mgPerM3,
          zoneHistories: s.zoneHistories,
          histories: batches.length * p.particlesPerBatch,
          peak15min_mgPerM3: s.peak15min_mgPerM3,
          peak15minCi95_mgPerM3: s.peak15minCi95_mgPerM3,
        },
        p.limit,
        p.judging,
      )
    : null;
  const relativeHalfWidth = s.twa8h_mgPerM3 > 0 ? (hi - lo) / 2 / s.twa8h_mgPerM3 : Infinity;
  const decided = verdict?.decided === true;
  const trusted = (s.zoneHistories ?? 0) >= MIN_ZONE_HISTORIES && hi > lo;
  const stop: LookOutcome['stop'] = decided
    ? 'decided'
    : trusted && relativeHalfWidth <= rule.relativeHalfWidth
      ? 'precision'
      : isLast
        ? 'max-batches'
        : null;
  const outcome: LookOutcome = {
    look: { batches: batches.length, alpha, mean_mgPerM3: s.twa8h_mgPerM3, ci_mgPerM3: [lo, hi], decided },
    relativeHalfWidth,
    stop,
  };
  return { outcome, verdict };
}

/** Runs batches first…first+count−1 and returns them in batch order (a worker pool, or a loop in a test). */
export type RunBatches = (first: number, count: number) => Promise<BatchResult[]>;

/**
 * Adds batches until the rule is met, looking only at the planned batch counts; the result's
 * intervals are at the error rate spent at the look that stopped, and the rule and every look
 * travel with it in engine.stopping, so the same scenario and seed give the same run.
 */
export async function runToPrecision(
  p: PreparedScenario,
  rule: RunPrecision,
  runBatches: RunBatches,
  onLook?: (outcome: LookOutcome) => void,
  /** Seconds since some start; without it the time is the sum of the batches' own times. */
  clock?: () => number,
): Promise<Results> {
  const plan = lookPlan(rule.maxBatches);
  const alphas = lookAlphas(plan);
  const fraction = p.limit?.fraction ?? 'respirable';
  const batches: BatchResult[] = [];
  const looks: Look[] = [];
  const started = clock?.() ?? 0;
  const elapsed = () => (clock ? clock() - started : undefined);
  for (let k = 0; k < plan.length; k++) {
    batches.push(...(await runBatches(batches.length, plan[k] - batches.length)));
    const { outcome } = lookAt(p, batches, rule, alphas[k], k === plan.length - 1);
    looks.push(outcome.look);
    onLook?.(outcome);
    if (outcome.stop) {
      const stopping: Stopping = {
        relativeHalfWidth: rule.relativeHalfWidth,
        maxBatches: rule.maxBatches,
        fraction,
        looks,
        reason: outcome.stop,
      };
      // The batches' tallies go with it, so a server can replay a sample of them (the look's count is the run's).
      return withBatchTallies(p, combineBatches(p, batches, elapsed(), { alpha: alphas[k], stopping }), batches);
    }
  }
  throw new Error('runToPrecision: the plan ended without a stop');
}
