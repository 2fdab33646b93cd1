import { describe, expect, it } from 'vitest';
import type { RunResult } from '../../shared/schemas/run-result';
import { parseScenario, type ScenarioInput } from '../../shared/schemas/scenario';
import { batchTally, type BatchResult, combineBatches, prepareScenario, runBatch } from '../../workers/engine/index';
import { lookAlphas, lookAt, lookPlan, runToPrecision } from '../../workers/run-to-precision';
import { lookFigureProblems, peakProblems, stoppingProblems } from './replay-run';

// A small real scenario: the worker stands 0.5 m from a burst, so histories reach the zone in every
// batch, and a limit far below what they breathe, so the first look can already decide Act.
const input = (relativeHalfWidth: number): ScenarioInput => ({
  room: { length_m: 4, width_m: 4, height_m: 3, eddyDiffusivity_m2PerS: 0.01 },
  source: { x_m: 2, y_m: 2, z_m: 1.2, emission: { kind: 'bursts', massPerEvent_mg: 1, eventsPerHour: 12, taskDuration_min: 15 } },
  dust: { density_kgPerM3: 1000, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 3e-6, gsd: 1.5 } },
  worker: { x_m: 2.5, y_m: 2, z_m: 1.2 },
  limit: { fraction: 'respirable', value_mgPerM3: 0.001 },
  run: { particles: 60, batches: 2, seed: 'replay-looks', maxTimeStep_s: 4, precision: { relativeHalfWidth, maxBatches: 80 } },
});

function setUp(relativeHalfWidth: number, withLimit = true) {
  const scenario = parseScenario({ ...input(relativeHalfWidth), ...(withLimit ? {} : { limit: undefined }) });
  const p = prepareScenario(scenario);
  const batches: BatchResult[] = Array.from({ length: 80 }, (_, k) => runBatch(p, k));
  const run = (first: number, count: number) => Promise.resolve(batches.slice(first, first + count));
  return { scenario, p, batches, run };
}

/** A result that claims to stop at look `last` (0-based) for `reason`, with the looks as the engine would record them. */
function claimed(s: ReturnType<typeof setUp>, last: number, reason: 'decided' | 'precision' | 'max-batches'): RunResult {
  const rule = s.scenario.run.precision!;
  const plan = lookPlan(rule.maxBatches);
  const alphas = lookAlphas(plan);
  const looks = plan
    .slice(0, last + 1)
    .map((n, k) => lookAt(s.p, s.batches.slice(0, n), rule, alphas[k], k === plan.length - 1).outcome.look);
  const stopping = {
    relativeHalfWidth: rule.relativeHalfWidth,
    maxBatches: rule.maxBatches,
    fraction: 'respirable' as const,
    looks,
    reason,
  };
  return combineBatches(s.p, s.batches.slice(0, plan[last]), undefined, { alpha: alphas[last], stopping }) as unknown as RunResult;
}

const tallies = (s: ReturnType<typeof setUp>, n: number) => s.batches.slice(0, n).map((b) => batchTally(s.p, b));

describe('a run to a precision, checked by the server', () => {
  it('passes when the engine stopped it: its looks combine from the tallies and the replay stops at the same look', async () => {
    const s = setUp(0.05);
    const result = (await runToPrecision(s.p, s.scenario.run.precision!, s.run)) as unknown as RunResult;
    expect(lookFigureProblems(s.p, result, tallies(s, result.engine.batches))).toEqual([]);
    expect(stoppingProblems(s.p, s.scenario, result, s.batches)).toEqual([]);
  });

  it('refuses a run that went on past the look that decided it (picking a later look is a second chance at the verdict)', () => {
    const s = setUp(0.05);
    // The set-up must make the first look decide, or this test would prove nothing.
    const first = lookAt(s.p, s.batches.slice(0, 20), s.scenario.run.precision!, lookAlphas(lookPlan(80))[0], false).outcome;
    expect(first.stop).toBe('decided');
    const forged = claimed(s, 1, 'decided');
    expect(lookFigureProblems(s.p, forged, tallies(s, 40))).toEqual([]);
    expect(stoppingProblems(s.p, s.scenario, forged, s.batches)).toEqual([
      'the rule was met at look 1 (20 batches: decided); the run went on to 40 batches',
    ]);
  });

  it('refuses a run that stopped before its rule was met, calling itself precise', () => {
    const s2 = setUp(0.05, false);
    // Without a limit nothing is decided, and ±5 % needs more than 20 batches of 60 particles.
    const first = lookAt(s2.p, s2.batches.slice(0, 20), s2.scenario.run.precision!, lookAlphas(lookPlan(80))[0], false).outcome;
    expect(first.stop).toBeNull();
    const forged = claimed(s2, 0, 'precision');
    expect(stoppingProblems(s2.p, s2.scenario, forged, s2.batches)).toEqual([
      'at 20 batches the rule is not met yet; the result stopped there (precision)',
    ]);
  });

  it('refuses looks whose recorded 8-h TWA was edited after the run', async () => {
    const s = setUp(0.05);
    const result = (await runToPrecision(s.p, s.scenario.run.precision!, s.run)) as unknown as RunResult;
    const edited = structuredClone(result);
    edited.engine.stopping!.looks[0].mean_mgPerM3 *= 0.5;
    expect(lookFigureProblems(s.p, edited, tallies(s, result.engine.batches))).toEqual([
      'look 1 (20 batches): its 8-h TWA and interval do not combine from the batches',
    ]);
  });
});

describe('the 15-min peaks, checked on approval', () => {
  it('pass when they follow from the batches, and are refused when edited (they are not in the tallies)', () => {
    const s = setUp(0.05);
    const batches = s.batches.slice(0, 20);
    const honest = combineBatches(s.p, batches) as unknown as RunResult;
    expect(peakProblems(s.p, honest, batches, 0.05)).toEqual([]);
    const edited = structuredClone(honest);
    edited.breathingZone.fractions.respirable.peak15min_mgPerM3 *= 0.2;
    expect(peakProblems(s.p, edited, batches, 0.05)).toEqual(['the respirable 15-min peak does not follow from the replayed batches']);
  });
});
