import { readFile } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import { withJetSpeedScaled } from '../../shared/physics/release-jets';
import { ScenarioError, parseScenario, type Scenario } from '../../shared/schemas/scenario';
import { combineBatches, prepareScenario } from '../engine/index';
import { resultsToJson, summary } from './format-results';
import { USAGE, parseSimArgs } from './sim-args';
import { runOnThreads, ThreadPool } from './thread-pool';

async function readScenario(file: string): Promise<Record<string, unknown>> {
  let text: string;
  try {
    text = await readFile(file, 'utf8');
  } catch (error) {
    throw new Error(`cannot read ${file}: ${(error as NodeJS.ErrnoException).code ?? String(error)}`);
  }
  try {
    const value: unknown = JSON.parse(text);
    if (typeof value !== 'object' || value === null || Array.isArray(value)) throw new Error('the top level must be an object');
    return value as Record<string, unknown>;
  } catch (error) {
    throw new Error(`${file} is not a valid scenario JSON file: ${(error as Error).message}`);
  }
}

async function main(): Promise<void> {
  const args = parseSimArgs(process.argv.slice(2));
  const raw = await readScenario(args.file);
  const run = { ...((raw.run as object | undefined) ?? {}) } as Record<string, unknown>;
  if (args.particles !== undefined) run.particles = args.particles;
  if (args.seed !== undefined) run.seed = args.seed;
  const scenario = parseScenario({ ...raw, run });
  if (args.jetSensitivity) return jetSensitivity(scenario, args.workers ?? availableParallelism());
  const prepared = prepareScenario(scenario);
  const started = Date.now();
  const progress = args.json ? undefined : (fraction: number) => process.stderr.write(`\r${(100 * fraction).toFixed(0).padStart(3)} %`);
  const precision = scenario.run.precision;
  let results;
  if (precision) {
    const pool = new ThreadPool(args.workers ?? availableParallelism());
    try {
      results = await pool.runToPrecision(
        prepared,
        precision,
        args.json ? undefined : (o) => process.stderr.write(`\r${o.look.batches} batches, ±${(100 * o.relativeHalfWidth).toFixed(1)} %   `),
      );
    } finally {
      await pool.close();
    }
    if (!args.json) process.stderr.write('\n');
  } else {
    const batches = await runOnThreads(prepared, args.workers ?? availableParallelism(), progress);
    if (progress) process.stderr.write('\r');
    results = combineBatches(prepared, batches, (Date.now() - started) / 1000);
  }
  process.stdout.write(`${args.json ? resultsToJson(results) : summary(scenario.name ?? args.file, results)}\n`);
}

// The jet defaults are common practice, not measured: the verdict should not hang on them unseen.
async function jetSensitivity(scenario: Scenario, workers: number): Promise<void> {
  for (const factor of [0.5, 1, 2]) {
    const prepared = prepareScenario(parseScenario(withJetSpeedScaled(scenario, factor)));
    const r = combineBatches(prepared, await runOnThreads(prepared, workers));
    const jet = r.model?.jet;
    const limit = r.limit;
    process.stdout.write(
      `${factor}× jet (${jet ? `${jet.speed_mPerS.toPrecision(3)} m/s` : 'none'}): ${limit ? `${limit.banner}, ${limit.percentOfLimit.toPrecision(3)} % of the limit (upper ${limit.percentOfLimitUpper.toPrecision(3)} %)` : 'no limit'}, captured ${(100 * r.fate.captured).toPrecision(3)} %\n`,
    );
  }
}

main().catch((error: unknown) => {
  const message = error instanceof ScenarioError || error instanceof Error ? error.message : String(error);
  process.stderr.write(`${message}\n${error instanceof ScenarioError ? '' : `${USAGE}\n`}`);
  process.exit(1);
});
