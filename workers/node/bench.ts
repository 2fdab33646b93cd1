import { readFile } from 'node:fs/promises';
import { availableParallelism, loadavg } from 'node:os';
import { parseScenario } from '../../shared/schemas/scenario';
import { combineBatches, prepareScenario } from '../engine/index';
import type { PreparedScenario } from '../engine/index';
import { writeReadmeSection } from '../../tests/helpers/readme-section';
import { describeMemory, measureBatchMemory } from './memory-figure';
import { referenceScenario } from '../engine/reference-scenario';
import { BENCH_RULE, benchDemos, describeSideBySide, fomSideBySide } from './bench-demos';
import { ThreadPool } from './thread-pool';

const TIMED_PASSES = 3;

// The best of a few passes: on a shared machine other load only ever slows a pass down.
async function throughput(
  pool: ThreadPool,
  prepared: PreparedScenario,
): Promise<{ mps: number; steps: number; seconds: number; passes: number[] }> {
  await pool.run(prepared);
  let best = { mps: 0, steps: 0, seconds: 0 };
  const passes: number[] = [];
  for (let pass = 0; pass < TIMED_PASSES; pass++) {
    const started = performance.now();
    const batches = await pool.run(prepared);
    const seconds = (performance.now() - started) / 1000;
    const steps = batches.reduce((a, b) => a + b.particleSteps, 0);
    const mps = steps / seconds / 1e6;
    passes.push(mps);
    if (mps > best.mps) best = { mps, steps, seconds };
  }
  return { ...best, passes };
}

const list = (values: number[]) => values.map((v) => v.toFixed(1)).join(', ');

// `--batch-particles=N` sets the demos' batch size for the time to a decision (BENCH_RULE's by default).
function batchParticles(): number {
  const arg = process.argv.find((a) => a.startsWith('--batch-particles='));
  const n = arg ? Number(arg.slice('--batch-particles='.length)) : BENCH_RULE.particlesPerBatch;
  if (!Number.isInteger(n) || n < 1) throw new Error(`--batch-particles must be a whole number of particles, not ${arg}`);
  return n;
}

async function main(): Promise<void> {
  const cores = availableParallelism();
  const reference = prepareScenario(parseScenario(referenceScenario));
  const load = loadavg()
    .map((v) => v.toFixed(2))
    .join(' ');
  console.log(`Load average ${load} on ${cores} cores (figures are only comparable at similar load)`);
  // First, while no worker thread exists, so resident memory is the batch's alone.
  const memory = describeMemory(measureBatchMemory());
  console.log(`Memory: ${memory}`);
  console.log(
    `Reference scenario, seed ${reference.seed}: ${reference.particlesPerBatch * reference.batches} particles, ${reference.batches} batches (one pass warms the JIT, best of ${TIMED_PASSES} timed)`,
  );
  const one = new ThreadPool(1);
  const single = await throughput(one, reference);
  await one.close();
  console.log(
    `  1 worker:  ${single.mps.toFixed(1)} M particle-steps/s (${(single.steps / 1e6).toFixed(1)} M steps in ${single.seconds.toFixed(2)} s; passes ${list(single.passes)})`,
  );
  const all = new ThreadPool(cores);
  const many = await throughput(all, reference);
  console.log(
    `  ${cores} workers: ${many.mps.toFixed(1)} M particle-steps/s, ${(many.mps / single.mps).toFixed(2)}× one worker (passes ${list(many.passes)})`,
  );

  await all.close();
  const counts = [1, Math.min(2, cores)].filter((n, i, a) => a.indexOf(n) === i);
  const perBatch = batchParticles();
  const rule = `±${100 * BENCH_RULE.relativeHalfWidth} % or a decided verdict, batches of ${perBatch.toLocaleString('en')} particles, at most ${BENCH_RULE.maxBatches} batches`;
  console.log(`Every demo scenario to a decision (${rule}) on ${counts.join(' and ')} warm workers:`);
  const demos = await benchDemos(counts, (line) => console.log(line), perBatch);
  // With no history in the zone the interval cannot have a width; the screens then say it is not known (shared/format ciText).
  const zeroWidth = demos.filter((d) => !(d.narrowest > 0));
  const unexplained = zeroWidth.filter((d) => d.zoneHistories > 0);
  for (const d of zeroWidth.filter((z) => z.zoneHistories === 0))
    console.log(
      `  ${d.name}: no simulated dust reached the zone, so its interval has no width; the screens say "not known" instead of a range`,
    );
  if (unexplained.length > 0) console.log(`ZERO-WIDTH INTERVAL in: ${unexplained.map((d) => d.name).join(', ')}`);

  const sideBySide = await fomSideBySide();
  console.log(`Default demo, figure of merit side by side (${sideBySide.batches} batches a side, one worker, same seed):`);
  for (const line of describeSideBySide(sideBySide)) console.log(line);

  const again = new ThreadPool(cores);
  const demoText = await readFile(new URL('../../shared/demo-scenarios/default.json', import.meta.url), 'utf8');
  const demo = prepareScenario(parseScenario(JSON.parse(demoText)));
  const started = performance.now();
  const results = combineBatches(demo, await again.run(demo));
  const seconds = (performance.now() - started) / 1000;
  await again.close();
  const r = results.breathingZone.fractions.respirable;
  const half = (r.twa8hCi95_mgPerM3[1] - r.twa8hCi95_mgPerM3[0]) / 2;
  const halfWidth_pct = ((100 * half) / r.twa8h_mgPerM3).toFixed(1);
  console.log(
    `Default demo on ${cores} warm workers: ${seconds.toFixed(2)} s to result; respirable 8-h TWA ${r.twa8h_mgPerM3.toPrecision(3)} mg/m³ ± ${halfWidth_pct} % (95 % CI half-width)`,
  );
  if (process.argv.includes('--readme')) {
    writeReadmeSection('bench', [
      `- One worker: ${single.mps.toFixed(1)} M particle-steps/s (reference scenario, best of ${TIMED_PASSES} passes after a warm-up pass)`,
      `- All ${cores} cores: ${many.mps.toFixed(1)} M particle-steps/s, ${(many.mps / single.mps).toFixed(2)}× one worker`,
      `- Default demo: ${seconds.toFixed(2)} s to result on ${cores} warm workers; respirable 8-h TWA ${r.twa8h_mgPerM3.toPrecision(3)} mg/m³, 95 % CI half-width ${halfWidth_pct} % of the mean`,
      `- Time to a decision (${rule}; seconds on ${counts.join(' / ')} workers, batches, why it stopped, step cost on one worker, FOM of the plain walk and with variance reduction, the default):`,
      ...demos.map(
        (d) =>
          `  - ${d.name}: ${counts.map((n) => d.seconds[n].toFixed(2)).join(' / ')} s, ${d.batches} batches (${d.reason}), ${d.stepCost_ns.toFixed(0)} ns/step, FOM ${d.fomAnalog.toPrecision(3)} /s plain, ${d.fomReduced.toPrecision(3)} /s with variance reduction`,
      ),
      `- Default demo, FOM side by side (${sideBySide.batches} batches a side, one worker): plain ${sideBySide.arms[0].fom.toPrecision(3)} /s, with variance reduction ${sideBySide.arms[1].fom.toPrecision(3)} /s, ratio ${sideBySide.ratio.toFixed(2)}×`,
      `- Memory: ${memory}`,
      `- Load average at the start: ${load} (1, 5, 15 min) on ${cores} cores`,
    ]);
    console.log('README.md bench section rewritten');
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
