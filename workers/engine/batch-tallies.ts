import type { BatchTally } from '../../shared/schemas/batch-tally';
import { batchSeries, taskMean } from './combine';
import { TallyHash } from './tally-hash';
import { type BatchResult, type Fraction, FRACTIONS, type PreparedScenario, type Results } from './types';

export type { BatchTally };

/** Every tally of the batch, bit for bit, including the trajectory sample; wall time is left out. */
export function batchHash(batch: BatchResult): string {
  const h = new TallyHash();
  h.word(batch.batchIndex);
  h.number(batch.particleSteps);
  h.numbers(batch.zoneResidence_s);
  h.numbers(batch.fateMass_mg);
  h.numbers(batch.zoneHistories);
  h.numbers(batch.deposition_mg);
  h.numbers(batch.trajectories);
  h.numbers(batch.trajectoryBins);
  return h.hex();
}

/** Summary figures of one batch (its task-mean concentration, fate masses and zone histories per fraction) and its hash. */
export function batchTally(p: PreparedScenario, batch: BatchResult): BatchTally {
  const nB = p.bins.count;
  const taskMean_mgPerM3 = {} as Record<Fraction, number>;
  const zoneHistories = {} as Record<Fraction, number>;
  FRACTIONS.forEach((fraction, f) => {
    taskMean_mgPerM3[fraction] = taskMean(batchSeries(p, batch, fraction));
    let n = 0;
    for (let b = 0; b < nB; b++) if (p.bins.conventionWeight[f * nB + b] > 0) n += batch.zoneHistories[b];
    zoneHistories[fraction] = n;
  });
  return {
    batchIndex: batch.batchIndex,
    particleSteps: batch.particleSteps,
    taskMean_mgPerM3,
    fateMass_mg: Array.from(batch.fateMass_mg),
    zoneHistories,
    hash: batchHash(batch),
  };
}

/** The combined result with each batch's tally beside it, in batch order (what a saved run uploads). */
export function withBatchTallies(p: PreparedScenario, result: Results, batches: readonly BatchResult[]): Results {
  const ordered = [...batches].sort((a, b) => a.batchIndex - b.batchIndex);
  return { ...result, batchTallies: ordered.map((b) => batchTally(p, b)) };
}
