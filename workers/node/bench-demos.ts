import { readdir, readFile } from 'node:fs/promises';
import { parseScenario } from '../../shared/schemas/scenario';
import type { RunResult } from '../../shared/schemas/run-result';
import { combineBatches, prepareScenario } from '../engine/index';
import { PRECISION_BATCH_PARTICLES } from '../run-to-precision';
import { ThreadPool } from './thread-pool';

/**
 * The bench's rule: ±10 % or a decided verdict, as the issue's time to a decision; capped so the bench stays a few
 * minutes. Every demo runs in batches of `particlesPerBatch`, the size the editor starts a run to a precision with
 * (the demo files' own batches hold 4,000–15,000, which makes the first look at 20 batches cost 80,000–300,000
 * particles whatever the answer); `--batch-particles=N` changes it.
 */
export const BENCH_RULE = { relativeHalfWidth: 0.1, maxBatches: 160, particlesPerBatch: PRECISION_BATCH_PARTICLES };

/** The demo's own run settings with the bench's batch size: 20 batches of it, run to the rule. */
export function benchRun(run: object | undefined, particlesPerBatch: number, extra: object = {}) {
  return {
    ...run,
    batches: 20,
    particles: 20 * particlesPerBatch,
    precision: { relativeHalfWidth: BENCH_RULE.relativeHalfWidth, maxBatches: BENCH_RULE.maxBatches },
    ...extra,
  };
}

export interface DemoFigure {
  name: string;
  batches: number;
  reason: string;
  banner: string;
  seconds: Record<number, number>;
  /** Nanoseconds per particle-step on one worker. */
  stepCost_ns: number;
  /** 1 / (relative variance of the limit fraction's task mean × seconds on one worker), the plain walk (run.varianceReduction false). */
  fomAnalog: number;
  /** The same with variance reduction (the default, which the timings above use). */
  fomReduced: number;
  /** Narrowest 8-h interval of any fraction relative to its mean (0: an interval with no width). */
  narrowest: number;
  /** Source histories that reached the breathing zone, for the limit's fraction (0: none did, so the interval has no width). */
  zoneHistories: number;
}

const DIR = new URL('../../shared/demo-scenarios/', import.meta.url);

export function fom(result: RunResult, seconds: number): number {
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
export async function benchDemos(
  workerCounts: readonly number[],
  log: (line: string) => void,
  particlesPerBatch = BENCH_RULE.particlesPerBatch,
): Promise<DemoFigure[]> {
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
      const scenario = parseScenario({ ...raw, run: benchRun(raw.run, particlesPerBatch) });
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
      // The plain walk to the same rule on the first pool, for its figure of merit.
      const plain = prepareScenario(parseScenario({ ...raw, run: benchRun(raw.run, particlesPerBatch, { varianceReduction: false }) }));
      const plainStarted = performance.now();
      const plainResult = await pools.get(workerCounts[0])!.runToPrecision(plain, BENCH_RULE);
      const plainSeconds = ((performance.now() - plainStarted) / 1000) * workerCounts[0];
      const figure: DemoFigure = {
        name: file.replace(/\.json$/, ''),
        batches: r.engine.batches,
        reason: r.engine.stopping?.reason ?? '',
        banner: r.limit?.banner ?? 'none',
        seconds,
        stepCost_ns: (1e9 * one) / r.performance.particleSteps,
        fomAnalog: fom(plainResult, plainSeconds),
        fomReduced: fom(r, one),
        narrowest: narrowest(r),
        zoneHistories: r.breathingZone.fractions[r.limit?.fraction ?? 'respirable'].zoneHistories ?? 0,
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
  const reduced = `with variance reduction ${f.fomReduced.toPrecision(3)} (${(f.fomReduced / f.fomAnalog).toFixed(2)}×)`;
  return `  ${f.name.padEnd(32)} ${times}; ${f.batches} batches (${REASON[f.reason] ?? f.reason}), ${f.banner}; step ${f.stepCost_ns.toFixed(0)} ns; FOM plain walk ${f.fomAnalog.toPrecision(3)} /s, ${reduced}; narrowest interval ${(100 * f.narrowest).toFixed(1)} % of its mean`;
}

export interface SideBySide {
  batches: number;
  arms: { varianceReduction: boolean; seconds: number; relativeHalfWidth: number; fom: number; steps: number }[];
  ratio: number;
}

/**
 * The default demo's figure of merit with and without variance reduction, one after the other on
 * the same one-worker pool, the same seed and the same number of batches (at least 100 a side, so
 * each arm's variance is itself known to about ±14 %).
 */
export async function fomSideBySide(batches = 100, particlesPerBatch = 400): Promise<SideBySide> {
  const raw = JSON.parse(await readFile(new URL('default.json', DIR), 'utf8')) as { run?: object };
  const pool = new ThreadPool(1);
  try {
    const arms: SideBySide['arms'] = [];
    for (const varianceReduction of [false, true]) {
      const prepared = prepareScenario(
        parseScenario({ ...raw, run: { ...raw.run, particles: batches * particlesPerBatch, batches, varianceReduction } }),
      );
      await pool.run({ ...prepared, batches: 2 });
      const started = performance.now();
      const batchResults = await pool.run(prepared);
      const seconds = (performance.now() - started) / 1000;
      const result = combineBatches(prepared, batchResults) as unknown as RunResult;
      const s = result.breathingZone.fractions[result.limit?.fraction ?? 'respirable'];
      arms.push({
        varianceReduction,
        seconds,
        relativeHalfWidth: (s.taskMeanCi95_mgPerM3[1] - s.taskMean_mgPerM3) / s.taskMean_mgPerM3,
        fom: fom(result, seconds),
        steps: result.performance.particleSteps,
      });
    }
    return { batches, arms, ratio: arms[1].fom / arms[0].fom };
  } finally {
    await pool.close();
  }
}

export function describeSideBySide(f: SideBySide): string[] {
  return [
    ...f.arms.map(
      (a) =>
        `  ${a.varianceReduction ? 'with variance reduction' : 'plain walk            '}: ${a.seconds.toFixed(2)} s, ${(a.steps / 1e6).toFixed(1)} M steps, task mean ±${(100 * a.relativeHalfWidth).toFixed(1)} %, FOM ${a.fom.toPrecision(3)} /s`,
    ),
    `  ratio ${f.ratio.toFixed(2)}× (target ≥ 2×, aim 4×)`,
  ];
}
