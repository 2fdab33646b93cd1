import { readFile } from 'node:fs/promises';
import { parseScenario } from '../../shared/schemas/scenario';
import type { RunResult } from '../../shared/schemas/run-result';
import { combineBatches, prepareScenario } from '../engine/index';
import { BENCH_RULE } from './bench-demos';
import { ThreadPool } from './thread-pool';

/*
 * How often the batch interval misses the truth, for one demo and one batch size: `seeds` runs of 20 batches
 * (the first look of a run to a precision), each against a truth from 800 batches of another seed. The upper
 * bound below the truth is the miss that could read as a false Clear; nominal 2.5 % for a 95 % interval.
 *
 *   npm run bench:coverage -- joinery-sander-side-hood 1000 200
 *
 * With --precision each seed runs as the bench does instead (workers/node/bench-demos.ts BENCH_RULE: looks at 20, 40,
 * 80, 160 batches, the 5 % error rate spent over them), and the interval counted is the one of the look it stopped at:
 * the miss rate of the whole sequence of looks, whose one-sided nominal is again 2.5 %.
 */
const sequential = process.argv.includes('--precision');
const [name = 'joinery-sander-side-hood', perBatchArg = '1000', seedsArg = '200'] = process.argv
  .slice(2)
  .filter((a) => !a.startsWith('--'));
const perBatch = Number(perBatchArg);
const seeds = Number(seedsArg);
if (!Number.isInteger(perBatch) || perBatch < 1 || !Number.isInteger(seeds) || seeds < 1)
  throw new Error('usage: batch-coverage <demo name> <particles per batch> <seeds>');

async function main(): Promise<void> {
  const raw = JSON.parse(await readFile(new URL(`../../shared/demo-scenarios/${name}.json`, import.meta.url), 'utf8')) as { run?: object };
  const pool = new ThreadPool(2);
  const run = async (seed: number, batches: number, rule?: typeof BENCH_RULE) => {
    const p = prepareScenario(parseScenario({ ...raw, run: { ...raw.run, seed, batches, particles: perBatch * batches } }));
    const r = (rule ? await pool.runToPrecision(p, rule) : combineBatches(p, await pool.run(p))) as unknown as RunResult;
    if (!r.limit) throw new Error(`${name} has no limit to judge against`);
    const f = r.breathingZone.fractions[r.limit.fraction];
    return { mean: f.twa8h_mgPerM3, ci: f.twa8hCi95_mgPerM3, banner: r.limit.banner, batches: r.engine.batches };
  };
  try {
    const truth = await run(987_654_321, 800);
    console.log(
      `${name}, ${perBatch} particles a batch; truth from 800 batches ${truth.mean.toPrecision(4)} mg/m³ (${truth.ci.map((v) => v.toPrecision(4)).join('–')})`,
    );
    let below = 0;
    let above = 0;
    const banners: Record<string, number> = {};
    const stops: Record<number, number> = {};
    for (let seed = 1; seed <= seeds; seed++) {
      const r = await run(seed, 20, sequential ? BENCH_RULE : undefined);
      if (r.ci[1] < truth.mean) below++;
      else if (r.ci[0] > truth.mean) above++;
      banners[r.banner] = (banners[r.banner] ?? 0) + 1;
      stops[r.batches] = (stops[r.batches] ?? 0) + 1;
    }
    const pct = (n: number) => `${((100 * n) / seeds).toFixed(1)} %`;
    console.log(
      `${seeds} seeds ${sequential ? `run to the bench's rule (stopped at ${JSON.stringify(stops)} batches)` : 'of 20 batches'}: upper bound below the truth ${below} (${pct(below)}, nominal 2.5 %), lower bound above ${above} (${pct(above)}); banners ${JSON.stringify(banners)}`,
    );
  } finally {
    await pool.close();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
