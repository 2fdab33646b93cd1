import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../shared/schemas/scenario';
import { combineBatches, prepareScenario } from '../engine/index';
import { workstation } from '../engine/workstation.test-helper';
import { runOnThreads } from './thread-pool';

describe('worker-thread pool', () => {
  it('gives identical results with 1, 2 and 3 threads for the same seed', async () => {
    const p = prepareScenario(parseScenario({ ...workstation, run: { particles: 600, batches: 5, seed: 99 } }));
    const runs = [];
    for (const threads of [1, 2, 3]) {
      const r = combineBatches(p, await runOnThreads(p, threads), 1);
      runs.push(
        JSON.stringify({ ...r, performance: r.performance.particleSteps }, (_k, v: unknown) =>
          ArrayBuffer.isView(v) ? Array.from(v as Float64Array) : v,
        ),
      );
    }
    expect(runs[1]).toBe(runs[0]);
    expect(runs[2]).toBe(runs[0]);
  }, 30_000);
});
