import * as Comlink from 'comlink';
import { type BatchResult, type PreparedScenario, runBatch, transferables } from './engine/index';

let prepared: PreparedScenario | undefined;
// The scenario warm-up batches run on, apart from the run's: sent with its first batch, not again with each.
let warming: PreparedScenario | undefined;

const api = {
  prepare(scenario: PreparedScenario): void {
    prepared = scenario;
  },
  /** Runs one small batch and discards it, so the step loop is compiled before the first real run; null: the last scenario sent. */
  warmUp(scenario: PreparedScenario | null, batchIndex = 0): number {
    if (scenario) warming = scenario;
    return warming ? runBatch(warming, batchIndex).particleSteps : 0;
  },
  // Progress arrives as a Comlink proxy; its calls post messages and never block the loop.
  run(batchIndex: number, onProgress?: (fraction: number, particleSteps: number) => void): BatchResult {
    if (!prepared) throw new Error('simulation worker: run called before prepare');
    const result = runBatch(prepared, batchIndex, onProgress ? (f, s) => void onProgress(f, s) : undefined);
    return Comlink.transfer(result, transferables(result));
  },
};

export type SimulationWorkerApi = typeof api;

Comlink.expose(api, self);
