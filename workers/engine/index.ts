export { ENGINE_VERSION } from './version';
export { prepareScenario } from './prepare';
export { runBatch, transferables } from './run-batch';
export { combineBatches } from './combine';
export { BINS_PER_DECADE, SIZE_MAX_AERODYNAMIC_m, SIZE_MIN_PHYSICAL_m } from './size-grid';
export type { BatchResult, Fraction, PreparedScenario, Results } from './types';
export { FATES, FRACTIONS } from './types';
export { batchTally, withBatchTallies, type BatchTally } from './batch-tallies';
export { combinationProblems, tallyMismatch } from './tally-check';
