import { readFile } from 'node:fs/promises';
import { parseScenario } from '../../shared/schemas/scenario';
import type { RunResult } from '../../shared/schemas/run-result';
import { combineBatches, prepareScenario } from '../engine/index';
import { ThreadPool } from './thread-pool';

/*
 * How often the batch interval misses the truth, for one demo and one batch size: `seeds` runs of 20 batches
 * (the first look of a run to a precision), each against a truth from 800 batches of another seed. The upper
 * bound below the truth is the miss that could read as a false Clear; nominal 2.5 % for a 95 % interval.
 *
 *   npm run bench:coverage -- joinery-sander-side-hood 1000 200
 */
const [name = 'joinery-sander-side-hood', perBatchArg = '1000', seedsArg = '200'] = process.argv.slice(2);
const perBatch = Number(perBatchArg);
const seeds = Number(seedsArg);
if (!Number.isInteger(perBatch) || perBatch < 1 || !Number.isInteger(seeds) || seeds < 1)
  throw new Error('usage: batch-coverage <demo name> <particles per batch> <seeds>');

async function main(): Promise<void> {
  const raw = JSON.parse(await readFile(new URL(`../../shared/demo-scenarios/${name}.json`, import.meta.url), 'utf8')) as { run?: object };
  const pool = new ThreadPool(2);
  const run = async (seed: number, batches: number) => {
    const p = prepareScenario(parseScenario({ ...raw, run: { ...raw.run, seed, batches, particles: perBatch * batches } }));
    const r = combineBatches(p, await pool.run(p)) as unknown as RunResult;
    if (!r.limit) throw new Error(`${name} has no limit to judge against`);
    const f = r.breathingZone.fractions[r.limit.fraction];
    return { mean: f.twa8h_mgPerM3, ci: f.twa8hCi95_mgPerM3, banner: r.limit.banner };
  };
  try {
    const truth = await run(987_654_321, 800);
    console.log(
      `${name}, ${perBatch} particles a batch; truth from 800 batches ${truth.mean.toPrecision(4)} mg/m³ (${truth.ci.map((v) => v.toPrecision(4)).join('–')})`,
    );
    let below = 0;
    let above = 0;
    const banners: Record<string, number> = {};
    for (let seed = 1; seed <= seeds; seed++) {
      const r = await run(seed, 20);
      if (r.ci[1] < truth.mean) below++;
      else if (r.ci[0] > truth.mean) above++;
      banners[r.banner] = (banners[r.banner] ?? 0) + 1;
    }
    const pct = (n: number) => `${((100 * n) / seeds).toFixed(1)} %`;
    console.log(
      `${seeds} seeds of 20 batches: upper bound below the truth ${below} (${pct(below)}, nominal 2.5 %), lower bound above ${above} (${pct(above)}); banners ${JSON.stringify(banners)}`,
    );
  } finally {
    await pool.close();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
