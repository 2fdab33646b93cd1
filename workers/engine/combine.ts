import { judgeResult, limitBlock } from '../../shared/verdict/index';
import { crossChecks } from './cross-checks';
import { captureVelocityMap, captureVelocityNearMap, depositionMap } from './maps';
import { batchEstimate } from './statistics';
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
  type SeriesBand,
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
function twa8h(p: PreparedScenario, mean: number): number {
  const task = p.task.minutesPerShift;
  return (mean * task + p.task.background_mgPerM3 * (SHIFT_min - task)) / SHIFT_min;
}

function peak15min(p: PreparedScenario, mean: number[]): number {
  if (p.duration_s < SHORT_TERM_s) {
    const avg = mean.reduce((a, v) => a + v, 0) / mean.length;
    return (avg * p.duration_s + p.task.background_mgPerM3 * (SHORT_TERM_s - p.duration_s)) / SHORT_TERM_s;
  }
  const w = Math.max(1, Math.round(SHORT_TERM_s / p.timeBin_s));
  let best = 0;
  for (let start = 0; start + w <= mean.length; start++) {
    let sum = 0;
    for (let i = start; i < start + w; i++) sum += mean[i];
    best = Math.max(best, sum / w);
  }
  return best;
}

function summarise(p: PreparedScenario, batches: readonly BatchResult[], fraction: Fraction) {
  const perBatch = batches.map((b) => batchSeries(p, b, fraction));
  const band: SeriesBand = { mean: [], lo: [], hi: [] };
  for (let tb = 0; tb < p.timeBins; tb++) {
    const e = batchEstimate(perBatch.map((s) => s[tb]));
    band.mean.push(e.mean);
    band.lo.push(e.lo);
    band.hi.push(e.hi);
  }
  const mean = batchEstimate(perBatch.map(taskMean));
  const nB = p.bins.count;
  const f = FRACTIONS.indexOf(fraction);
  let zoneHistories = 0;
  for (const batch of batches)
    for (let b = 0; b < nB; b++) if (p.bins.conventionWeight[f * nB + b] > 0) zoneHistories += batch.zoneHistories[b];
  const summary: FractionSummary = {
    taskMean_mgPerM3: mean.mean,
    taskMeanCi95_mgPerM3: [mean.lo, mean.hi],
    twa8h_mgPerM3: twa8h(p, mean.mean),
    twa8hCi95_mgPerM3: [twa8h(p, mean.lo), twa8h(p, mean.hi)],
    peak15min_mgPerM3: peak15min(p, band.mean),
    zoneHistories,
  };
  return { summary, band };
}

function nearMap(p: PreparedScenario) {
  const near = captureVelocityNearMap(p);
  return near ? { captureVelocityNear_mPerS: near } : {};
}

/** Merge batch results (any order, any worker) into the results object; batch order is fixed first. */
export function combineBatches(p: PreparedScenario, unordered: readonly BatchResult[], elapsed_s?: number): Results {
  const batches = [...unordered].sort((a, b) => a.batchIndex - b.batchIndex);
  const fractions = {} as Record<Fraction, FractionSummary>;
  const series = { time_s: Array.from({ length: p.timeBins }, (_, i) => (i + 0.5) * p.timeBin_s) } as Results['breathingZone']['series'];
  for (const fraction of FRACTIONS) {
    const { summary, band } = summarise(p, batches, fraction);
    fractions[fraction] = summary;
    series[fraction] = band;
  }
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
  if (p.limit) results.limit = limitBlock(judgeResult(results, p.limit, { captureVelocity: p.captureVelocity }));
  return results;
}
