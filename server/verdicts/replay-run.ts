import { randomInt } from 'node:crypto';
import type { RunResult } from '../../shared/schemas/run-result';
import type { Scenario } from '../../shared/schemas/scenario';
import type { BatchTally } from '../../workers/engine/batch-tallies';
import { twa8h } from '../../workers/engine/combine';
import {
  type BatchResult,
  combinationProblems,
  combineBatches,
  ENGINE_VERSION,
  type PreparedScenario,
  prepareScenario,
  tallyMismatch,
} from '../../workers/engine/index';
import { batchEstimate, batchEstimateAt } from '../../workers/engine/statistics';
import { lookAlphas, lookAt, lookPlan } from '../../workers/run-to-precision';
import { replayBatches } from './replay-pool';

/** Batches replayed before a run is stored: at least two, chosen after the upload. */
export const REPLAY_SAMPLE = 2;

export type ReplayOutcome = { ok: true; replayed: number[]; seconds: number } | { ok: false; replayed: number[]; problems: string[] };

/** `count` distinct batch indices out of 0…batches−1, drawn with the server's cryptographic generator. */
export function sampleBatches(batches: number, count: number): number[] {
  const pool = Array.from({ length: batches }, (_, k) => k);
  for (let i = 0; i < Math.min(count, batches); i++) {
    const j = i + randomInt(batches - i);
    [pool[i], pool[j]] = [pool[j], pool[i]];
  }
  return pool.slice(0, Math.min(count, batches)).sort((a, b) => a - b);
}

/**
 * The batch count a run must carry and its intervals' error rate. A fixed run has the scenario's
 * batches at 95 %; a run to a precision stops at one of its planned looks, must list every look up
 * to it, and its intervals are at the error rate spent at that look.
 */
export function expectedRun(input: Scenario, result: RunResult, batches: number): { batches: number; alpha: number } | string {
  const rule = input.run.precision;
  const stopping = result.engine.stopping;
  if (!rule)
    return stopping ? 'the result says it ran to a precision; the scenario runs a fixed number of batches' : { batches, alpha: 0.05 };
  if (!stopping) return 'the scenario runs to a precision; the result carries no record of its looks';
  if (stopping.relativeHalfWidth !== rule.relativeHalfWidth || stopping.maxBatches !== rule.maxBatches)
    return "the result's precision rule is not the scenario's";
  const plan = lookPlan(rule.maxBatches);
  const k = plan.indexOf(result.engine.batches);
  if (k < 0 || stopping.looks.length !== k + 1 || stopping.looks.some((look, i) => look.batches !== plan[i]))
    return `a run to this precision looks at ${plan.join(', ')} batches and stops at one of them; the result's looks do not follow that plan`;
  return { batches: plan[k], alpha: lookAlphas(plan)[k] };
}

/**
 * Checks an uploaded run against the engine: its per-batch figures must combine to its result,
 * and the batches replayed here must match their uploaded tallies bit for bit. `sample` null
 * replays every batch (approval).
 */
export async function replayRun(input: Scenario, result: RunResult, sample: number | null): Promise<ReplayOutcome> {
  const started = performance.now();
  if (result.engine.version !== ENGINE_VERSION)
    return {
      ok: false,
      replayed: [],
      problems: [`the run came from engine ${result.engine.version}; the server replays with ${ENGINE_VERSION}`],
    };
  const tallies = result.batchTallies;
  if (!tallies?.length) return { ok: false, replayed: [], problems: ['the result carries no per-batch tallies to replay'] };
  const prepared = prepareScenario(input);
  const expected = expectedRun(input, result, prepared.batches);
  if (typeof expected === 'string') return { ok: false, replayed: [], problems: [expected] };
  const problems = [...combinationProblems(prepared, result, tallies, expected), ...lookFigureProblems(prepared, result, tallies)];
  if (problems.length) return { ok: false, replayed: [], problems };
  const replayed = sample === null ? tallies.map((t) => t.batchIndex) : sampleBatches(expected.batches, sample);
  const fresh = await replayBatches(prepared, replayed);
  const mismatches = fresh.tallies.map((t) => tallyMismatch(tallies[t.batchIndex], t)).filter((m): m is string => m !== null);
  if (mismatches.length) return { ok: false, replayed, problems: mismatches };
  // Every batch replayed and matching: the peaks (which need the whole series, not in the tallies) and the looks can be redone.
  const redone =
    sample === null
      ? [...peakProblems(prepared, result, fresh.batches, expected.alpha), ...stoppingProblems(prepared, input, result, fresh.batches)]
      : [];
  if (redone.length) return { ok: false, replayed, problems: redone };
  return { ok: true, replayed, seconds: (performance.now() - started) / 1000 };
}

const sameFigure = (a: number | undefined, b: number | undefined) =>
  a === b || (a !== undefined && b !== undefined && Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b)));

/**
 * The 15-min peaks, which the verdict compares with the short-term limit, recombined from every
 * replayed batch: an approval's check (a save's sample of batches cannot rebuild them).
 */
export function peakProblems(p: PreparedScenario, result: RunResult, batches: readonly BatchResult[], alpha: number): string[] {
  const redone = combineBatches(p, batches, undefined, { alpha, stopping: result.engine.stopping });
  const problems: string[] = [];
  for (const [fraction, mine] of Object.entries(redone.breathingZone.fractions)) {
    const theirs = result.breathingZone.fractions[fraction as keyof typeof result.breathingZone.fractions];
    const agree =
      sameFigure(mine.peak15min_mgPerM3, theirs.peak15min_mgPerM3) &&
      sameFigure(mine.peak15minCi95_mgPerM3?.[0], theirs.peak15minCi95_mgPerM3?.[0]) &&
      sameFigure(mine.peak15minCi95_mgPerM3?.[1], theirs.peak15minCi95_mgPerM3?.[1]);
    if (!agree) problems.push(`the ${fraction} 15-min peak does not follow from the replayed batches`);
  }
  return problems;
}

const close = (a: number, b: number) => a === b || Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));

/**
 * A run to a precision records each look's 8-h TWA and interval: they must combine from the
 * uploaded batch tallies at the error rate spent at that look, on the limit's fraction. Checked
 * before a run is stored; the looks' decisions need the peaks too, so they wait for the full replay.
 */
export function lookFigureProblems(p: PreparedScenario, result: RunResult, tallies: readonly BatchTally[]): string[] {
  const stopping = result.engine.stopping;
  if (!stopping) return [];
  const fraction = p.limit?.fraction ?? 'respirable';
  if (stopping.fraction !== fraction) return [`the looks judged the ${stopping.fraction} fraction; the scenario's limit is on ${fraction}`];
  const alphas = lookAlphas(lookPlan(stopping.maxBatches));
  const problems: string[] = [];
  stopping.looks.forEach((look, i) => {
    const values = tallies.slice(0, look.batches).map((t) => t.taskMean_mgPerM3[fraction]);
    const e = alphas[i] === 0.05 ? batchEstimate(values) : batchEstimateAt(values, alphas[i]);
    const agree =
      close(look.alpha, alphas[i]) &&
      close(look.mean_mgPerM3, twa8h(p, e.mean)) &&
      close(look.ci_mgPerM3[0], twa8h(p, e.lo)) &&
      close(look.ci_mgPerM3[1], twa8h(p, e.hi));
    if (!agree) problems.push(`look ${i + 1} (${look.batches} batches): its 8-h TWA and interval do not combine from the batches`);
  });
  return problems;
}

/**
 * The stopping rule redone on the replayed batches: no earlier look may have met it, and the last
 * one must, for the reason the result gives (or be the last planned look). So a run cannot go on
 * past a decided look, nor stop short of the rule and call itself done.
 */
export function stoppingProblems(p: PreparedScenario, input: Scenario, result: RunResult, batches: readonly BatchResult[]): string[] {
  const rule = input.run.precision;
  const stopping = result.engine.stopping;
  if (!rule || !stopping) return [];
  const plan = lookPlan(rule.maxBatches);
  const alphas = lookAlphas(plan);
  const last = stopping.looks.length - 1;
  for (let k = 0; k <= last; k++) {
    const { outcome } = lookAt(p, batches.slice(0, plan[k]), rule, alphas[k], k === plan.length - 1);
    if (outcome.look.decided !== stopping.looks[k].decided)
      return [
        `look ${k + 1} (${plan[k]} batches): the server's replay ${outcome.look.decided ? 'decides' : 'does not decide'} the verdict; the result says otherwise`,
      ];
    if (k < last && outcome.stop)
      return [`the rule was met at look ${k + 1} (${plan[k]} batches: ${outcome.stop}); the run went on to ${plan[last]} batches`];
    if (k === last && outcome.stop !== stopping.reason)
      return [
        outcome.stop
          ? `at ${plan[k]} batches the run stops for ${outcome.stop}; the result says ${stopping.reason}`
          : `at ${plan[k]} batches the rule is not met yet; the result stopped there (${stopping.reason})`,
      ];
  }
  return [];
}
