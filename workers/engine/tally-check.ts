import type { BatchTally } from './batch-tallies';
import { twa8h } from './combine';
import { batchEstimate, batchEstimateAt } from './statistics';
import { FATES, FRACTIONS, type PreparedScenario, type Results } from './types';

// The browser combined the same numbers in the same order, so they agree to the last bit; the
// allowance only spares a harmless reordering of a sum.
const close = (a: number, b: number) => a === b || Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));

/**
 * Whether the uploaded per-batch figures combine to the uploaded result's headline numbers (the
 * ones every verdict is judged from). Returns what disagrees, in words; empty when they agree.
 */
export function combinationProblems(
  p: PreparedScenario,
  result: Results,
  tallies: readonly BatchTally[],
  /** The batch count the run must have and its intervals' error rate: a run to a precision stops at one of its looks. */
  expected: { batches: number; alpha: number } = { batches: p.batches, alpha: 0.05 },
): string[] {
  const problems: string[] = [];
  const { batches, alpha } = expected;
  if (tallies.length !== batches || result.engine.batches !== batches)
    return [`the scenario runs ${batches} batches; the result names ${result.engine.batches} and carries ${tallies.length} batch tallies`];
  if (tallies.some((t, k) => t.batchIndex !== k)) return ['the batch tallies are not batches 0…n−1 in order'];
  if (result.engine.particles !== p.particlesPerBatch * batches)
    problems.push(`the result claims ${result.engine.particles} particles; the scenario runs ${p.particlesPerBatch * batches}`);
  const steps = tallies.reduce((a, t) => a + t.particleSteps, 0);
  if (steps !== result.performance.particleSteps)
    problems.push(`the batches took ${steps} particle-steps; the result claims ${result.performance.particleSteps}`);
  for (const f of FRACTIONS) {
    const values = tallies.map((t) => t.taskMean_mgPerM3[f]);
    // The same estimate combine used: the plain 95 % one, or the one at the error rate spent where a run to a precision stopped.
    const e = alpha === 0.05 ? batchEstimate(values) : batchEstimateAt(values, alpha);
    const s = result.breathingZone.fractions[f];
    const agree =
      close(e.mean, s.taskMean_mgPerM3) &&
      close(e.lo, s.taskMeanCi95_mgPerM3[0]) &&
      close(e.hi, s.taskMeanCi95_mgPerM3[1]) &&
      close(twa8h(p, e.mean), s.twa8h_mgPerM3) &&
      close(twa8h(p, e.lo), s.twa8hCi95_mgPerM3[0]) &&
      close(twa8h(p, e.hi), s.twa8hCi95_mgPerM3[1]);
    if (!agree) problems.push(`the batches' ${f} concentrations do not combine to the result's mean, interval and 8-h TWA`);
    const histories = tallies.reduce((a, t) => a + t.zoneHistories[f], 0);
    if (s.zoneHistories !== undefined && s.zoneHistories !== histories)
      problems.push(`${histories} ${f} histories reached the breathing zone in the batches; the result claims ${s.zoneHistories}`);
  }
  const emitted = p.emission.emitted_mg;
  FATES.forEach((fate, i) => {
    const share = emitted > 0 ? tallies.reduce((a, t) => a + t.fateMass_mg[i], 0) / (tallies.length * emitted) : 0;
    if (!close(share, result.fate[fate])) problems.push(`the batches' ${fate} mass does not combine to the result's share`);
  });
  return problems;
}

/** Where a replayed batch differs from its uploaded tally; empty when they match bit for bit. */
export function tallyMismatch(uploaded: BatchTally, replayed: BatchTally): string | null {
  if (uploaded.hash !== replayed.hash)
    return `batch ${replayed.batchIndex}: its tallies hash to ${replayed.hash} on the server, ${uploaded.hash} uploaded`;
  const same =
    uploaded.particleSteps === replayed.particleSteps &&
    FRACTIONS.every(
      (f) =>
        Object.is(uploaded.taskMean_mgPerM3[f], replayed.taskMean_mgPerM3[f]) && uploaded.zoneHistories[f] === replayed.zoneHistories[f],
    ) &&
    replayed.fateMass_mg.every((m, i) => Object.is(m, uploaded.fateMass_mg[i]));
  if (!same) return `batch ${replayed.batchIndex}: its summary figures differ from the server's replay`;
  return null;
}
