export { ENGINE_VERSION } from './version';
export { prepareScenario } from './prepare';
export { runBatch, transferables } from './run-batch';
export { combineBatches } from './combine';
export { SIZE_BIN_COUNT } from './size-bins';
export type { BatchResult, Fraction, PreparedScenario, Results } from './types';
export { FATES, FRACTIONS } from './types';
