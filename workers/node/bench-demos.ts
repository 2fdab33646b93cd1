import { readdir, readFile } from 'node:fs/promises';
import { parseScenario } from '../../shared/schemas/scenario';
import type { RunResult } from '../../shared/schemas/run-result';
import { prepareScenario } from '../engine/index';
import { ThreadPool } from './thread-pool';

/** The bench's rule: ±10 % or a decided verdict, as the time to a decision; capped so the bench stays a few minutes. */
export const BENCH_RULE = { relativeHalfWidth: 0.1, maxBatches: 160 };

export interface DemoFigure {
  name: string;
  batches: number;
  reason: string;
  banner: string;
  seconds: Record<number, number>;
  /** Nanoseconds per particle-step on one worker. */
  stepCost_ns: number;
  /** 1 / (relative variance of the limit fraction's task mean × seconds on one worker), the plain walk. */
  fomAnalog: number;
  /** The same with variance reduction: the lead fills this in when run.varianceReduction exists. */
  fomReduced: number | null;
  /** Narrowest 8-h interval of any fraction relative to its mean (0 would be a zero-width interval on screen). */
  narrowest: number;
}

const DIR = new URL('../../shared/demo-scenarios/', import.meta.url);

function fom(result: RunResult, seconds: number): number {
  const s = result.breathingZone.fractions[result.limit?.fraction ?? 'respirable'];
  // The stored interval is the spent one; its half-width over t still scales as the standard error.
  const relativeHalf = (s.taskMeanCi95_mgPerM3[1] - s.taskMean_mgPerM3) / s.taskMean_mgPerM3;
  return relativeHalf > 0 && seconds > 0 ? 1 / (relativeHalf ** 2 * seconds) : 0;
}

function narrowest(result: RunResult): number {
  return Math.min(
    ...Object.values(result.breathingZone.fractions).map((s) =>
      s.twa8h_mgPerM3 > 0 ? (s.twa8hCi95_mgPerM3[1] - s.twa8hCi95_mgPerM3[0]) / s.twa8h_mgPerM3 : 0,
    ),
  );
}

/** Every demo scenario run to a decision on warm pools of each size; the same seed gives the same batches on each. */
export async function benchDemos(workerCounts: readonly number[], log: (line: string) => void): Promise<DemoFigure[]> {
  const files = (await readdir(DIR)).filter((f) => f.endsWith('.json')).sort();
  const pools = new Map(workerCounts.map((n) => [n, new ThreadPool(n)]));
  const figures: DemoFigure[] = [];
  try {
    // One small run per pool compiles the step loop in every thread before anything is timed.
    const warm = prepareScenario(
      parseScenario({ ...JSON.parse(await readFile(new URL(files[0], DIR), 'utf8')), run: { particles: 4000, batches: 4 } }),
    );
    for (const pool of pools.values()) await pool.run(warm);
    for (const file of files) {
      const raw = JSON.parse(await readFile(new URL(file, DIR), 'utf8')) as { run?: object };
      const scenario = parseScenario({ ...raw, run: { ...raw.run, precision: BENCH_RULE } });
      const prepared = prepareScenario(scenario);
      const seconds: Record<number, number> = {};
      let result: RunResult | undefined;
      for (const [n, pool] of pools) {
        const started = performance.now();
        result = await pool.runToPrecision(prepared, BENCH_RULE);
        seconds[n] = (performance.now() - started) / 1000;
      }
      const r = result!;
      const one = seconds[workerCounts[0]] * workerCounts[0];
      const figure: DemoFigure = {
        name: file.replace(/\.json$/, ''),
        batches: r.engine.batches,
        reason: r.engine.stopping?.reason ?? '',
        banner: r.limit?.banner ?? 'none',
        seconds,
        stepCost_ns: (1e9 * one) / r.performance.particleSteps,
        fomAnalog: fom(r, one),
        fomReduced: null,
        narrowest: narrowest(r),
      };
      figures.push(figure);
      log(describeDemo(figure));
    }
  } finally {
    await Promise.all([...pools.values()].map((p) => p.close()));
  }
  return figures;
}

const REASON: Record<string, string> = { decided: 'decided', precision: '±10 %', 'max-batches': 'cap reached' };

export function describeDemo(f: DemoFigure): string {
  const times = Object.entries(f.seconds)
    .map(([n, s]) => `${s.toFixed(2)} s on ${n}`)
    .join(', ');
  const reduced =
    f.fomReduced === null ? 'FOM with variance reduction: not built yet' : `FOM with variance reduction ${f.fomReduced.toPrecision(3)}`;
  return `  ${f.name.padEnd(32)} ${times}; ${f.batches} batches (${REASON[f.reason] ?? f.reason}), ${f.banner}; step ${f.stepCost_ns.toFixed(0)} ns; FOM analog ${f.fomAnalog.toPrecision(3)} /s, ${reduced}; narrowest interval ${(100 * f.narrowest).toFixed(1)} % of its mean`;
}
