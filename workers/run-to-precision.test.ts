import { describe, expect, it } from 'vitest';
import { FATES } from '../shared/vocabulary/fractions';
import { prepareTest } from './engine/engine.test-helper';
import { type BatchResult, combineBatches, type PreparedScenario, runBatch } from './engine/index';
import { batchStream } from './engine/rng';
import { lookAlphas, lookAt, lookPlan, type RunBatches, runToPrecision, TOTAL_ALPHA } from './run-to-precision';
import { type BatchWorker, scheduleBatches } from './schedule-batches';

describe('the looks and the error rate spent at each', () => {
  it('looks at 20·2^k batches up to the cap and spends exactly the total error rate over them', () => {
    const plan = lookPlan(640);
    expect(plan).toEqual([20, 40, 80, 160, 320, 640]);
    const alphas = lookAlphas(plan);
    expect(alphas.reduce((a, v) => a + v, 0)).toBeCloseTo(TOTAL_ALPHA, 12);
    // Linear spending: the last look, which reads half the batches anew, gets half the rate.
    expect(alphas[5]).toBeCloseTo(TOTAL_ALPHA / 2, 12);
    expect(lookPlan(100)).toEqual([20, 40, 80]);
  });
});

// A one-bin prepared scenario whose batches are written directly: batch k's total-fraction task mean is
// drawn from Normal(mean, 0.3·mean) on its own seeded stream, and enough histories reach the zone.
const LIMIT_mgPerM3 = 2;
const TRUTH_mgPerM3 = 1; // half the limit: the Clear threshold itself, with a day-to-day GSD of 1.

function syntheticScenario(): PreparedScenario {
  return prepareTest(
    { source: { taskMinutesPerShift: 480 }, worker: { dayToDayGsd: 1 }, limit: { fraction: 'total', value_mgPerM3: LIMIT_mgPerM3 } },
    (p) => {
      p.bins = {
        count: 1,
        aerodynamic_m: Float64Array.of(1e-6),
        physical_m: Float64Array.of(1e-6),
        massFraction: Float64Array.of(1),
        profileMassFraction: Float64Array.of(1),
        settling_mPerS: Float64Array.of(0),
        diffusivity_m2PerS: Float64Array.of(0.01),
        brownianDiffusivity_m2PerS: Float64Array.of(0),
        particleMass_mg: Float64Array.of(1),
        particlesPerBatch: Int32Array.of(p.particlesPerBatch),
        conventionWeight: Float64Array.of(1, 1, 1, 1),
        massLeftOut: { share: 0, below: 0, above: 0, lowerPhysical_m: 1e-6, upperAerodynamic_m: 1e-6 },
      };
      // One sampled path of two frames: the batches' tallies hash it, and 200 seeds × 640 batches of full samples cost minutes.
      p.trajectory = { ...p.trajectory, particles: 1, frames: 2 };
    },
  );
}

// Parts combine reads but the verdict does not: shared by every synthetic batch, so 200 seeds allocate little.
const unused = new Map<
  PreparedScenario,
  Pick<BatchResult, 'fateMass_mg' | 'deposition_mg' | 'trajectories' | 'trajectoryBins' | 'trajectoryFates' | 'trajectoryEnds'>
>();
function unusedParts(p: PreparedScenario) {
  if (!unused.has(p))
    unused.set(p, {
      fateMass_mg: new Float64Array(FATES.length),
      deposition_mg: new Float64Array(p.deposition.nx * p.deposition.ny),
      trajectories: new Float32Array(p.trajectory.particles * p.trajectory.frames * 3),
      trajectoryBins: new Int32Array(p.trajectory.particles).fill(-1),
      trajectoryFates: new Int8Array(p.trajectory.particles).fill(-1),
      trajectoryEnds: new Float32Array(p.trajectory.particles * 8).fill(NaN),
    });
  return unused.get(p)!;
}

function syntheticBatch(p: PreparedScenario, seed: number, k: number): BatchResult {
  const rng = batchStream(`coverage:${seed}`, k);
  const z = Math.sqrt(-2 * Math.log(rng.nextUniform())) * Math.cos(2 * Math.PI * rng.nextUniform());
  const value_mgPerM3 = Math.max(0, TRUTH_mgPerM3 * (1 + 0.3 * z));
  // Residence that makes every time bin's concentration the batch's value (combine.ts batchSeries).
  const residence = (value_mgPerM3 * p.zone.volume_m3 * p.timeBin_s) / p.bins.particleMass_mg[0];
  return {
    batchIndex: k,
    ...unusedParts(p),
    zoneResidence_s: new Float64Array(p.timeBins).fill(residence),
    zoneHistories: Int32Array.of(50),
    particleSteps: 1,
    splitCopies: 0,
    rouletteRemoved: 0,
    wallTime_s: 0,
  };
}

const syntheticRun =
  (p: PreparedScenario, seed: number): RunBatches =>
  (first, count) =>
    Promise.resolve(Array.from({ length: count }, (_, i) => syntheticBatch(p, seed, first + i)));

describe('run to a precision: coverage with the truth at the Clear threshold (200 seeds)', () => {
  // Normal batch means with the truth at the threshold: a Clear is always false, and a single 95 % look gives one
  // 2.5 % of the time (one-sided); that is the nominal rate the sequence of looks must keep (common practice).
  const SEEDS = 200;
  const rule = { relativeHalfWidth: 0.01, maxBatches: 640 }; // narrow enough that every seed can use all six looks

  it('keeps the false-Clear rate at its nominal level, where looking at 95 % each time would not', async () => {
    const p = syntheticScenario();
    let spentClears = 0;
    let naiveClears = 0;
    const plan = lookPlan(rule.maxBatches);
    for (let seed = 0; seed < SEEDS; seed++) {
      const result = await runToPrecision(p, rule, syntheticRun(p, seed));
      if (result.limit?.banner === 'clear') spentClears++;
      // The same batches looked at with a plain 95 % interval each time, stopping at the first decided look.
      const all = await syntheticRun(p, seed)(0, rule.maxBatches);
      for (const n of plan) {
        const { verdict } = lookAt(p, all.slice(0, n), rule, 0.05, n === rule.maxBatches);
        if (verdict?.decided) {
          if (verdict.banner === 'clear') naiveClears++;
          break;
        }
      }
    }
    const nominal = SEEDS * (TOTAL_ALPHA / 2);
    // Binomial(200, 0.025) exceeds 11 with probability under 1 % (exact tail, from memory).
    expect(spentClears).toBeLessThanOrEqual(11);
    expect(naiveClears).toBeGreaterThan(nominal);
    expect(naiveClears).toBeGreaterThan(spentClears);
  }, 120_000);
});

// A small real scenario: the worker stands 0.5 m from a burst, so histories reach the zone in every batch.
const tiny = () =>
  prepareTest({
    room: { length_m: 4, width_m: 4, height_m: 3, eddyDiffusivity_m2PerS: 0.01 },
    source: { x_m: 2, y_m: 2, z_m: 1.2, emission: { kind: 'bursts', massPerEvent_mg: 1, eventsPerHour: 12, taskDuration_min: 15 } },
    worker: { x_m: 2.5, y_m: 2, z_m: 1.2 },
    limit: { fraction: 'respirable', value_mgPerM3: 0.5 },
    run: { particles: 60, batches: 2, seed: 'stop-rule', maxTimeStep_s: 4 },
  });

// In-process workers that finish their batches in a scrambled order.
function pool(p: PreparedScenario, size: number): RunBatches {
  const workers: BatchWorker<BatchResult>[] = Array.from({ length: size }, (_, w) => ({
    prepare: () => {},
    run: async (batchIndex) => {
      for (let i = 0; i < (batchIndex * 7 + w) % 3; i++) await new Promise((r) => setTimeout(r, 0));
      return runBatch(p, batchIndex);
    },
  }));
  return (first, count) => scheduleBatches(workers, count, { first });
}

const withoutTimes = (r: object) => JSON.parse(JSON.stringify(r, (k, v: unknown) => (k === 'performance' ? undefined : v)));

describe('run to a precision: reproducible', () => {
  const rule = { relativeHalfWidth: 0.05, maxBatches: 40 };

  it('stops at the same look with the same numbers on one worker and on three, and stores the rule with the looks', async () => {
    const p = tiny();
    const one = await runToPrecision(p, rule, pool(p, 1));
    const three = await runToPrecision(p, rule, pool(p, 3));
    expect(withoutTimes(three)).toEqual(withoutTimes(one));
    const stopping = one.engine.stopping!;
    expect(stopping).toMatchObject({ relativeHalfWidth: 0.05, maxBatches: 40, fraction: 'respirable' });
    expect(stopping.looks.map((l) => l.batches)).toEqual([20, 40].slice(0, stopping.looks.length));
    expect(one.engine.batches).toBe(stopping.looks[stopping.looks.length - 1].batches);
    expect(one.engine.particles).toBe(one.engine.batches * p.particlesPerBatch);
  }, 120_000);

  it('reports batches 0…N−1 of the same seed stream: the mean is that of those batches run directly', async () => {
    const p = tiny();
    const result = await runToPrecision(p, rule, pool(p, 2));
    const direct = combineBatches(
      p,
      Array.from({ length: result.engine.batches }, (_, k) => runBatch(p, k)),
    );
    expect(result.breathingZone.fractions.respirable.twa8h_mgPerM3).toBe(direct.breathingZone.fractions.respirable.twa8h_mgPerM3);
    // The stored interval is the spent one, never narrower than the plain 95 % interval of the same batches.
    const [lo, hi] = result.breathingZone.fractions.respirable.twa8hCi95_mgPerM3;
    const [dlo, dhi] = direct.breathingZone.fractions.respirable.twa8hCi95_mgPerM3;
    expect(hi - lo).toBeGreaterThan(dhi - dlo);
  }, 120_000);
});
