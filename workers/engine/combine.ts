import { judgeResult, limitBlock } from '../../shared/verdict/index';
import { crossChecks } from './cross-checks';
import { captureVelocityMap, captureVelocityNearMap, depositionMap } from './maps';
import { splitPeak } from './peak-window';
import { chooseMerge, mergedBand, onMerge, visitsPerTimeBin } from './series-bins';
import { batchEstimate, batchEstimateAt, type Estimate } from './statistics';
import { mergeTrajectories } from './trajectory-sample';
import {
  type BatchResult,
  type Fate,
  FATES,
  type Fraction,
  type FractionSummary,
  FRACTIONS,
  type PreparedScenario,
  type Results,
  type Stopping,
} from './types';
import { ENGINE_VERSION } from './version';

const SHIFT_min = 480;
const SHORT_TERM_s = 900;

/** Breathing-zone concentration per time bin of one batch, mg/m³. */
export function batchSeries(p: PreparedScenario, batch: BatchResult, fraction: Fraction): Float64Array {
  const nB = p.bins.count;
  const f = FRACTIONS.indexOf(fraction);
  const series = new Float64Array(p.timeBins);
  const scale = 1 / (p.zone.volume_m3 * p.timeBin_s);
  for (let tb = 0; tb < p.timeBins; tb++) {
    let sum = 0;
    for (let b = 0; b < nB; b++)
      sum += batch.zoneResidence_s[tb * nB + b] * p.bins.particleMass_mg[b] * p.bins.conventionWeight[f * nB + b];
    series[tb] = sum * scale;
  }
  return series;
}

export function taskMean(series: Float64Array): number {
  return series.reduce((a, v) => a + v, 0) / series.length;
}

// Task time at the simulated mean, the rest of the shift at background: Σ Cᵢtᵢ / 8 h (29 CFR 1910.1000(d); EN 689).
export function twa8h(p: PreparedScenario, mean: number): number {
  const task = p.task.minutesPerShift;
  return (mean * task + p.task.background_mgPerM3 * (SHIFT_min - task)) / SHIFT_min;
}

// Shorter than 15 min: the task's mean over all batches, diluted by background to a 15-min average; no window is chosen, so no selection bias.
function shortTaskPeak(p: PreparedScenario, taskMeans: Estimate) {
  const dilute = (c: number) => (c * p.duration_s + p.task.background_mgPerM3 * (SHORT_TERM_s - p.duration_s)) / SHORT_TERM_s;
  return {
    mean: dilute(taskMeans.mean),
    ci: [dilute(taskMeans.lo), dilute(taskMeans.hi)] as [number, number],
    window_s: [0, p.duration_s] as [number, number],
  };
}

/** Two-sided error rate of the task-mean and 8-h intervals: 0.05 for a fixed run; a run to a precision spends less per look. */
export interface CombineOptions {
  alpha?: number;
  stopping?: Stopping;
}

function zoneHistoriesOf(p: PreparedScenario, batches: readonly BatchResult[], f: number) {
  const nB = p.bins.count;
  const histories = new Float64Array(nB);
  for (const batch of batches) for (let b = 0; b < nB; b++) histories[b] += batch.zoneHistories[b];
  let total = 0;
  for (let b = 0; b < nB; b++) if (p.bins.conventionWeight[f * nB + b] > 0) total += histories[b];
  return { histories, total };
}

/** One fraction's figures over the batches given (in batch order), intervals at the two-sided error rate alpha. */
export function summarise(p: PreparedScenario, batches: readonly BatchResult[], fraction: Fraction, alpha: number) {
  const perBatch = batches.map((b) => batchSeries(p, b, fraction));
  const taskMeans = perBatch.map(taskMean);
  const mean = alpha === 0.05 ? batchEstimate(taskMeans) : batchEstimateAt(taskMeans, alpha);
  const f = FRACTIONS.indexOf(fraction);
  const { total: zoneHistories } = zoneHistoriesOf(p, batches, f);
  const peak =
    p.duration_s < SHORT_TERM_s
      ? shortTaskPeak(p, batchEstimate(taskMeans))
      : splitPeak(perBatch, Math.max(1, Math.round(SHORT_TERM_s / p.timeBin_s)), p.timeBin_s);
  const summary: FractionSummary = {
    taskMean_mgPerM3: mean.mean,
    taskMeanCi95_mgPerM3: [mean.lo, mean.hi],
    twa8h_mgPerM3: twa8h(p, mean.mean),
    twa8hCi95_mgPerM3: [twa8h(p, mean.lo), twa8h(p, mean.hi)],
    peak15min_mgPerM3: peak.mean,
    ...(peak.ci ? { peak15minCi95_mgPerM3: peak.ci } : {}),
    peak15minWindow_s: peak.window_s,
    zoneHistories,
  };
  return { summary, perBatch };
}

function residenceSum(p: PreparedScenario, batches: readonly BatchResult[]): Float64Array {
  const sum = new Float64Array(p.timeBins * p.bins.count);
  for (const b of batches) for (let i = 0; i < sum.length; i++) sum[i] += b.zoneResidence_s[i];
  return sum;
}

/**
 * The concentration series on time bins coarse enough that each bin that matters holds enough zone
 * visits, chosen on the limit's fraction so every fraction shares one time axis.
 */
function seriesOf(
  p: PreparedScenario,
  batches: readonly BatchResult[],
  perBatch: Record<Fraction, Float64Array[]>,
): Results['breathingZone']['series'] {
  const residence = residenceSum(p, batches);
  const nB = p.bins.count;
  const visits = (fraction: Fraction) => {
    const f = FRACTIONS.indexOf(fraction);
    const weight = p.bins.conventionWeight.subarray(f * nB, (f + 1) * nB);
    return visitsPerTimeBin(residence, zoneHistoriesOf(p, batches, f).histories, weight, p.timeBins);
  };
  const { merge } = chooseMerge(visits(p.limit?.fraction ?? 'respirable'));
  const binWidth_s = merge * p.timeBin_s;
  const bins = Math.floor(p.timeBins / merge);
  const series = {
    time_s: Array.from({ length: bins }, (_, i) => (i + 0.5) * binWidth_s),
    binWidth_s,
  } as Results['breathingZone']['series'];
  for (const fraction of FRACTIONS) {
    const m = onMerge(visits(fraction), merge);
    series[fraction] = { ...mergedBand(perBatch[fraction], merge), visits: m.visits, sparse: m.sparse };
  }
  return series;
}

function nearMap(p: PreparedScenario) {
  const near = captureVelocityNearMap(p);
  return near ? { captureVelocityNear_mPerS: near } : {};
}

/** Merge batch results (any order, any worker) into the results object; batch order is fixed first. */
export function combineBatches(
  p: PreparedScenario,
  unordered: readonly BatchResult[],
  elapsed_s?: number,
  { alpha = 0.05, stopping }: CombineOptions = {},
): Results {
  const batches = [...unordered].sort((a, b) => a.batchIndex - b.batchIndex);
  const fractions = {} as Record<Fraction, FractionSummary>;
  const perBatch = {} as Record<Fraction, Float64Array[]>;
  for (const fraction of FRACTIONS) {
    const s = summarise(p, batches, fraction, alpha);
    fractions[fraction] = s.summary;
    perBatch[fraction] = s.perBatch;
  }
  const series = seriesOf(p, batches, perBatch);
  const emitted = p.emission.emitted_mg;
  // Shares of the whole emission: particles carry only the simulated sizes, massLeftOut the rest.
  const fate = { emitted_mg: emitted } as Results['fate'];
  FATES.forEach((name: Fate, i) => {
    fate[name] = emitted > 0 ? batches.reduce((a, b) => a + b.fateMass_mg[i], 0) / (batches.length * emitted) : 0;
  });
  const particleSteps = batches.reduce((a, b) => a + b.particleSteps, 0);
  const wallTime_s = elapsed_s ?? batches.reduce((a, b) => a + b.wallTime_s, 0);
  const results: Results = {
    engine: {
      version: ENGINE_VERSION,
      seed: p.seed,
      particles: p.particlesPerBatch * batches.length,
      batches: batches.length,
      timeStep_s: p.maxTimeStep_s,
      stepFraction: p.stepFraction,
      sizeBins: p.bins.count,
      ...(stopping ? { stopping } : {}),
    },
    breathingZone: { volume_m3: p.zone.volume_m3, fractions, series },
    fate,
    massLeftOut: { ...p.bins.massLeftOut },
    crossChecks: crossChecks(p, p.limit?.fraction ?? 'respirable'),
    maps: { deposition_mgPerM2: depositionMap(p, batches), captureVelocity_mPerS: captureVelocityMap(p), ...nearMap(p) },
    trajectories: mergeTrajectories(p, batches),
    sizeBins: { aerodynamic_m: Array.from(p.bins.aerodynamic_m), physical_m: Array.from(p.bins.physical_m) },
    model: p.model,
    performance: { particleSteps, wallTime_s, particleStepsPerS: wallTime_s > 0 ? particleSteps / wallTime_s : 0 },
  };
  if (p.limit) results.limit = limitBlock(judgeResult(results, p.limit, p.judging));
  return results;
}
