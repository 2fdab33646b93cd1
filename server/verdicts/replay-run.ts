import { randomInt } from 'node:crypto';
import type { RunResult } from '../../shared/schemas/run-result';
import type { Scenario } from '../../shared/schemas/scenario';
import { combinationProblems, ENGINE_VERSION, prepareScenario, tallyMismatch } from '../../workers/engine/index';
import { lookAlphas, lookPlan } from '../../workers/run-to-precision';
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
  const problems = combinationProblems(prepared, result, tallies, expected);
  if (problems.length) return { ok: false, replayed: [], problems };
  const replayed = sample === null ? tallies.map((t) => t.batchIndex) : sampleBatches(expected.batches, sample);
  const fresh = await replayBatches(prepared, replayed);
  const mismatches = fresh.map((t) => tallyMismatch(tallies[t.batchIndex], t)).filter((m): m is string => m !== null);
  if (mismatches.length) return { ok: false, replayed, problems: mismatches };
  return { ok: true, replayed, seconds: (performance.now() - started) / 1000 };
}
