import { z } from 'zod';
import { BANNERS, FATES, type Fate, FRACTIONS, type Fraction } from '../vocabulary/fractions';
import { batchTallySchema } from './batch-tally';
import { float32List, int32List, measured, numberList, pair } from './run-result-lists';

const conc = z.number().finite().gte(0);
const ci = z.tuple([z.number().finite(), z.number().finite()]);
// Shares are mass ratios summed in floating point: allow the last bit of rounding either side of [0, 1].
const share = z
  .number()
  .finite()
  .gte(-1e-9)
  .lte(1 + 1e-9);
const count = z.number().int().gte(0);
// A fate's share is an estimate with variance reduction (Russian roulette survivors carry the weight
// of those removed), so in a small run it may pass 1 a little; twice the emission is beyond any noise.
const fateShare = z.number().finite().gte(-1e-9).lte(2);

function perFraction<T extends z.ZodType>(schema: T) {
  return Object.fromEntries(FRACTIONS.map((f) => [f, schema])) as Record<Fraction, T>;
}
function perFate<T extends z.ZodType>(schema: T) {
  return Object.fromEntries(FATES.map((f) => [f, schema])) as Record<Fate, T>;
}

export const fractionSummarySchema = z.object({
  taskMean_mgPerM3: conc,
  taskMeanCi95_mgPerM3: ci,
  twa8h_mgPerM3: conc,
  twa8hCi95_mgPerM3: ci,
  peak15min_mgPerM3: conc,
  /** Interval of the peak 15-min average, estimated on batches other than those that chose its window; absent in older results. */
  peak15minCi95_mgPerM3: ci.optional(),
  /** Start and end of the window the peak was chosen in, s from the task start. */
  peak15minWindow_s: ci.optional(),
  /** Simulated particles that spent any time in the breathing zone and count for this fraction; absent in older results (unknown). */
  zoneHistories: count.optional(),
});

export const seriesBandSchema = z.object({
  mean: numberList,
  lo: numberList,
  hi: numberList,
  /** Estimated zone visits per time bin, and whether too few of them make the series unreadable; absent in older results. */
  visits: numberList.optional(),
  sparse: z.boolean().optional(),
});

const lookSchema = z.object({
  batches: z.number().int().positive(),
  /** Two-sided error rate spent at this look. */
  alpha: z.number().gt(0).lt(1),
  mean_mgPerM3: conc,
  ci_mgPerM3: ci,
  decided: z.boolean(),
});

/** How a run to a precision stopped: its rule, each look at 20·2^k batches, and why it stopped there. */
export const stoppingSchema = z.object({
  relativeHalfWidth: z.number().gt(0).lte(1),
  maxBatches: z.number().int().positive(),
  fraction: z.enum(FRACTIONS),
  looks: z.array(lookSchema).min(1).max(12),
  reason: z.enum(['precision', 'decided', 'max-batches']),
});

const gridShape = { nx: count, ny: count, cell_m: pair, origin_m: pair, values: float32List };
type GridOut = { nx: number; ny: number; values: Float32Array };
function cellsMatch(grid: GridOut, ctx: z.RefinementCtx) {
  if (grid.values.length !== grid.nx * grid.ny)
    ctx.addIssue({
      code: 'custom',
      path: ['values'],
      message: `must hold nx·ny = ${grid.nx * grid.ny} numbers, got ${grid.values.length}`,
      input: grid.values,
    });
}
/** A plan-view map, values [ix][iy] as the engine writes them. */
export const gridSchema = z.object(gridShape).superRefine(cellsMatch);
const captureGridSchema = z.object({ ...gridShape, height_m: z.number() }).superRefine(cellsMatch);

export const trajectoriesSchema = z
  .object({
    particles: count,
    frames: count,
    frameInterval_s: z.number().positive(),
    /** [particle][frame][xyz]; NaN where the particle is not airborne. */
    positions_m: float32List,
    /** Size bin per sampled particle, −1 for an unused slot. */
    bins: int32List,
    /** Where each sampled particle ended up (FATES index), −1 for an unused slot; absent in results recorded before it. */
    fates: int32List.optional(),
    /** Per sampled particle [released_s, x, y, z, ended_s, x, y, z] (m); absent in results recorded before it. */
    ends: float32List.optional(),
  })
  .superRefine((t, ctx) => {
    if (t.fates && t.fates.length !== t.bins.length)
      ctx.addIssue({
        code: 'custom',
        path: ['fates'],
        message: `must hold one fate per sampled particle (${t.bins.length}), got ${t.fates.length}`,
        input: t.fates,
      });
    if (t.ends && t.ends.length !== t.bins.length * 8)
      ctx.addIssue({
        code: 'custom',
        path: ['ends'],
        message: `must hold 8 numbers per sampled particle (${t.bins.length * 8}), got ${t.ends.length}`,
        input: t.ends,
      });
    const expected = t.particles * t.frames * 3;
    if (t.positions_m.length !== expected)
      ctx.addIssue({
        code: 'custom',
        path: ['positions_m'],
        message: `must hold particles·frames·3 = ${expected} numbers, got ${t.positions_m.length}`,
        input: t.positions_m,
      });
  });

export const resultLimitSchema = z.object({
  fraction: z.enum(FRACTIONS),
  value_mgPerM3: z.number().positive(),
  percentOfLimit: z.number().finite(),
  percentOfLimitUpper: z.number().finite(),
  ratingCategory: z.union([z.literal(0), z.literal(1), z.literal(2), z.literal(3), z.literal(4)]),
  banner: z.enum(BANNERS),
  // The verdict's own account (shared/verdict); absent in results judged before it.
  p95_mgPerM3: conc.optional(),
  decided: z.boolean().optional(),
  reasons: z.array(z.string().max(500)).max(10).optional(),
  moreHistories: count.nullable().optional(),
  gsd: z.number().finite().gte(1).optional(),
  shortTerm: z
    .object({
      value_mgPerM3: z.number().positive(),
      percentOfLimit: z.number().finite(),
      percentOfLimitUpper: z.number().finite(),
      exceeds: z.enum(['no', 'maybe', 'yes']),
    })
    .optional(),
});

export const modelSchema = z.object({
  roomDiffusivity_m2PerS: z.number().finite().gte(0),
  /** The range measured in real rooms that an estimate is clamped to; null when the engineer gave the value. */
  roomDiffusivityRange_m2PerS: z.tuple([z.number(), z.number()]).nullable(),
  roomDiffusivityBasis: z.string().max(300),
  lagrangianTime_s: z.number().finite().gte(0),
  jet: z
    .object({
      speed_mPerS: z.number().finite().gt(0),
      diameter_m: z.number().finite().gt(0),
      direction: z.tuple([z.number(), z.number(), z.number()]),
      fromDefault: z.boolean(),
    })
    .nullable(),
  wallDeposition: z.boolean(),
  frictionVelocity_mPerS: z.number().finite().gte(0),
});

/**
 * Emitted mass outside the simulated sizes (1 nm physical to 100 µm aerodynamic diameter), as shares
 * of the emission. It is never renormalised into the simulated sizes: fates plus share make one.
 */
export const massLeftOutSchema = z.object({
  share,
  below: share,
  above: share,
  lowerPhysical_m: z.number().positive(),
  upperAerodynamic_m: z.number().positive(),
});

/** A run's result in the shape the current engine writes; typed arrays or their JSON lists both read. */
export const runResultSchema = z.object({
  engine: z.object({
    version: z.string().min(1).max(40),
    seed: z.union([z.number(), z.string()]),
    particles: z.number().int().positive(),
    batches: z.number().int().positive(),
    timeStep_s: z.number().positive(),
    stepFraction: z.number().positive(),
    sizeBins: count,
    stopping: stoppingSchema.optional(),
  }),
  breathingZone: z.object({
    volume_m3: z.number().positive(),
    fractions: z.object(perFraction(fractionSummarySchema)),
    series: z.object({ time_s: numberList, binWidth_s: z.number().positive().optional(), ...perFraction(seriesBandSchema) }),
  }),
  // Results of engines before 2.0 had no wall deposition: their walls share reads 0.
  fate: z.object({ emitted_mg: conc, ...perFate(fateShare), walls: fateShare.default(0) }),
  /** Absent in results of engines before 1.4.0, whose bins renormalised it away (unknown). */
  massLeftOut: massLeftOutSchema.optional(),
  limit: resultLimitSchema.optional(),
  crossChecks: z.object({
    fraction: z.enum(FRACTIONS),
    wellMixed_mgPerM3: measured,
    nearField_mgPerM3: measured,
    farField_mgPerM3: measured,
    eddySteady_mgPerM3: measured,
  }),
  maps: z.object({
    deposition_mgPerM2: gridSchema,
    captureVelocity_mPerS: captureGridSchema,
    /** The capture-velocity map over the workstation only, finer; absent without hoods and in older results. */
    captureVelocityNear_mPerS: captureGridSchema.optional(),
  }),
  trajectories: trajectoriesSchema,
  /** Diameter per size bin (index = trajectories.bins value); empty lists when the result predates them. */
  sizeBins: z.object({ aerodynamic_m: numberList, physical_m: numberList }),
  /** What the engine assumed beyond the inputs; absent in results of engines before 2.0. */
  model: modelSchema.optional(),
  performance: z.object({ particleSteps: count, wallTime_s: z.number().gte(0), particleStepsPerS: z.number().gte(0) }),
  /** Per-batch figures and hashes the server replays a sample of before it stores a run; absent in older results. */
  batchTallies: z.array(batchTallySchema).max(1000).optional(),
});

export type RunResult = z.output<typeof runResultSchema>;
export type FractionSummary = RunResult['breathingZone']['fractions'][Fraction];
export type SeriesBand = RunResult['breathingZone']['series'][Fraction];
export type Grid = z.output<typeof gridSchema>;
export type MassLeftOut = z.output<typeof massLeftOutSchema>;
export type ResultLimit = z.output<typeof resultLimitSchema>;
export type Trajectories = RunResult['trajectories'];
export type Ci = FractionSummary['twa8hCi95_mgPerM3'];
export type Stopping = z.output<typeof stoppingSchema>;
export type Look = Stopping['looks'][number];
