export { ENGINE_VERSION } from './version.ts';
export { prepareScenario } from './prepare.ts';
export { runBatch, transferables } from './run-batch.ts';
export { combineBatches } from './combine.ts';
export { SIZE_BIN_COUNT } from './size-bins.ts';
export type { BatchResult, Fraction, PreparedScenario, Results } from './types.ts';
export { FATES, FRACTIONS } from './types.ts';
