import { parentPort } from 'node:worker_threads';
import { runBatch, transferables } from '../engine/index';
import type { PreparedScenario } from '../engine/index';

export type ThreadRequest = { type: 'prepare'; prepared: PreparedScenario } | { type: 'run'; batchIndex: number };

let prepared: PreparedScenario | undefined;

parentPort?.on('message', (message: ThreadRequest) => {
  if (message.type === 'prepare') {
    prepared = message.prepared;
    return;
  }
  if (!prepared) throw new Error('batch thread: run before prepare');
  const result = runBatch(prepared, message.batchIndex, (fraction, particleSteps) =>
    parentPort?.postMessage({ type: 'progress', batchIndex: message.batchIndex, fraction, particleSteps }),
  );
  parentPort?.postMessage({ type: 'done', result }, transferables(result));
});
