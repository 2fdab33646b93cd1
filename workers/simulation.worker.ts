import * as Comlink from 'comlink';
import { type BatchResult, type PreparedScenario, runBatch, transferables } from './engine/index';

// The scenario the batches run on: a run's, or a warm-up's until the next run sends its own (simulation-bridge.ts).
let prepared: PreparedScenario | undefined;

const api = {
  prepare(scenario: PreparedScenario): void {
    prepared = scenario;
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
