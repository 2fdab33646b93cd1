import { readFile } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import { parseScenario } from '../../shared/schemas/scenario.ts';
import { combineBatches, prepareScenario } from '../engine/index.ts';
import type { PreparedScenario } from '../engine/index.ts';
import { referenceScenario } from './reference-scenario.ts';
import { ThreadPool } from './thread-pool.ts';

async function throughput(pool: ThreadPool, prepared: PreparedScenario): Promise<{ mps: number; steps: number; seconds: number }> {
  await pool.run(prepared);
  const started = performance.now();
  const batches = await pool.run(prepared);
  const seconds = (performance.now() - started) / 1000;
  const steps = batches.reduce((a, b) => a + b.particleSteps, 0);
  return { mps: steps / seconds / 1e6, steps, seconds };
}

async function main(): Promise<void> {
  const cores = availableParallelism();
  const reference = prepareScenario(parseScenario(referenceScenario));
  console.log(`Reference scenario, seed ${reference.seed}: ${reference.particlesPerBatch * reference.batches} particles, ${reference.batches} batches (first pass warms the JIT, second is timed)`);
  const one = new ThreadPool(1);
  const single = await throughput(one, reference);
  await one.close();
  console.log(`  1 worker:  ${single.mps.toFixed(1)} M particle-steps/s (${(single.steps / 1e6).toFixed(1)} M steps in ${single.seconds.toFixed(2)} s)`);
  const all = new ThreadPool(cores);
  const many = await throughput(all, reference);
  console.log(`  ${cores} workers: ${many.mps.toFixed(1)} M particle-steps/s, ${(many.mps / single.mps).toFixed(2)}× one worker`);

  const demoText = await readFile(new URL('../../server/demo/scenarios/default.json', import.meta.url), 'utf8');
  const demo = prepareScenario(parseScenario(JSON.parse(demoText)));
  const started = performance.now();
  const results = combineBatches(demo, await all.run(demo));
  const seconds = (performance.now() - started) / 1000;
  await all.close();
  const r = results.breathingZone.fractions.respirable;
  const half = (r.twa8hCi95_mgPerM3[1] - r.twa8hCi95_mgPerM3[0]) / 2;
  console.log(`Default demo on ${cores} warm workers: ${seconds.toFixed(2)} s to result; respirable 8-h TWA ${r.twa8h_mgPerM3.toPrecision(3)} mg/m³ ± ${((100 * half) / r.twa8h_mgPerM3).toFixed(1)} % (95 % CI half-width)`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
