import { z } from 'zod';
import { upgradeScenario } from './scenario-upgrade';
import { HOOD_KINDS, RELEASE_TYPES } from '../vocabulary/index';

const finite = (min?: { gt?: number; gte?: number }) => {
  let schema = z.number();
  if (min?.gt !== undefined) schema = schema.gt(min.gt);
  if (min?.gte !== undefined) schema = schema.gte(min.gte);
  return schema;
};
const positive = () => finite({ gt: 0 });
const nonNegative = () => finite({ gte: 0 });

// Bounds that keep one scenario within what a browser, the server and a reader can handle.
export const SCENARIO_BOUNDS = { particles: 5_000_000, duration_s: 24 * 3600, text: 200 } as const;
const text = () => z.string().max(SCENARIO_BOUNDS.text, `must be at most ${SCENARIO_BOUNDS.text} characters`);
const taskDuration = () => positive().max(SCENARIO_BOUNDS.duration_s / 60, 'must be at most 24 h (1440 min)');

const roomSchema = z.object({
  length_m: positive(),
  width_m: positive(),
  height_m: positive(),
  airChanges_perH: nonNegative().default(4),
  draftSpeed_mPerS: nonNegative().default(0),
  draftDirection_deg: finite().default(0),
  temperature_K: positive().default(293.15),
  pressure_Pa: positive().default(101325),
  eddyDiffusivity_m2PerS: nonNegative().optional(),
  wallDeposition: z.boolean().default(true),
});

const emissionSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('continuous'), rate_mgPerMin: nonNegative(), taskDuration_min: taskDuration() }),
  z.object({
    kind: z.literal('bursts'),
    massPerEvent_mg: nonNegative(),
    eventsPerHour: positive(),
    taskDuration_min: taskDuration(),
  }),
]);

const directionSchema = z.union([
  z.object({ x: finite(), y: finite(), z: finite() }),
  z.object({ azimuth_deg: finite(), elevation_deg: finite().default(0) }),
]);

const releaseTypeSchema = z.enum(RELEASE_TYPES);

// Without a direction the jet points at the breathing zone (shared/physics/release-jets.ts).
const jetSchema = z.object({
  speed_mPerS: z.number().gte(0, 'must be 0 to 100 m/s').lte(100, 'must be 0 to 100 m/s'),
  direction: directionSchema.optional(),
  diameter_m: z.number().gte(0.001, 'must be 1 mm to 1 m').lte(1, 'must be 1 mm to 1 m'),
});

const sourceSchema = z.object({
  x_m: finite(),
  y_m: finite(),
  z_m: finite(),
  shape: z.enum(['point', 'disc', 'box']).default('point'),
  size_m: nonNegative().default(0),
  emission: emissionSchema,
  taskMinutesPerShift: finite({ gte: 0 }).max(480).optional(),
  background_mgPerM3: nonNegative().default(0),
  releaseType: releaseTypeSchema.optional(),
  jet: jetSchema.optional(),
});

const sizeProfileSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('lognormal'),
    basis: z.enum(['mmad', 'cmd']),
    median_m: positive(),
    gsd: finite({ gte: 1 }),
  }),
  z.object({
    kind: z.literal('bins'),
    basis: z.enum(['mass', 'count']),
    diameter: z.enum(['aerodynamic', 'physical']).default('aerodynamic'),
    edges_m: z.array(positive()).min(2),
    amounts: z.array(nonNegative()).min(1),
  }),
]);

const dustSchema = z.object({
  name: text().optional(),
  density_kgPerM3: positive(),
  shapeFactor: finite({ gte: 1 }).default(1),
  sizeProfile: sizeProfileSchema,
});

/** For a downdraft bench the face is the work surface: faceWidth_m is its length (along +x), faceHeight_m its depth (along +y). */
const hoodFields = z.object({
  name: text().optional(),
  kind: z.enum(HOOD_KINDS),
  x_m: finite(),
  y_m: finite(),
  z_m: finite(),
  direction: directionSchema,
  faceWidth_m: positive(),
  faceHeight_m: positive(),
  airflow_m3PerS: nonNegative(),
});

/** The one direction a downdraft bench has: its work surface faces straight up. */
export const BENCH_DIRECTION = { x: 0, y: 0, z: 1 } as const;

// A bench's work surface cannot face anywhere but up, so whatever direction is sent is replaced rather than
// refused: switching a hood's kind to a bench never strands the record on a direction nobody can see.
const hoodSchema = hoodFields.transform((hood): z.output<typeof hoodFields> =>
  hood.kind === 'downdraft-bench' ? { ...hood, direction: { ...BENCH_DIRECTION } } : hood,
);

const workerSchema = z.object({
  x_m: finite(),
  y_m: finite(),
  z_m: finite(),
  radius_m: positive().default(0.3),
  posture: z.enum(['standing', 'seated']).optional(),
  /** Day-to-day GSD of this worker's 8-h exposures for the verdict's 95th percentile; absent means the trade's default (shared/verdict). */
  dayToDayGsd: finite({ gte: 1 }).max(6).optional(),
});

const limitSchema = z.object({
  fraction: z.enum(['total', 'inhalable', 'thoracic', 'respirable']),
  value_mgPerM3: positive(),
  shortTerm_mgPerM3: positive().optional(),
  source: text().optional(),
});

/**
 * Run until the limit fraction's 8-h TWA is known to ± relativeHalfWidth, or the verdict is decided,
 * looking only at 20, 40, 80, … batches up to maxBatches (workers/run-to-precision.ts).
 */
const precisionSchema = z.object({
  relativeHalfWidth: finite({ gt: 0 }).max(1).default(0.1),
  maxBatches: z.number().int().gte(20).lte(2560).default(640),
});

const runSchema = z.object({
  particles: z.number().int().gte(1).lte(SCENARIO_BOUNDS.particles, 'must be at most 5,000,000 particles per run').default(20000),
  seed: z.union([z.number().int(), text().min(1)]).default(1),
  batches: z.number().int().gte(2).lte(1000).default(10),
  duration_s: positive().max(SCENARIO_BOUNDS.duration_s, 'must be at most 24 h (86400 s)').optional(),
  maxTimeStep_s: positive().default(2),
  stepFraction: finite({ gt: 0 }).lte(1).default(0.5),
  precision: precisionSchema.optional(),
  /** Splitting near the breathing zone and Russian roulette deep in a hood's capture region; false runs the plain (analog) walk, kept for checks. */
  varianceReduction: z.boolean().default(true),
});

const baseSchema = z.object({
  name: text().optional(),
  description: text().optional(),
  room: roomSchema,
  source: sourceSchema,
  dust: dustSchema,
  hoods: z.array(hoodSchema).max(8).default([]),
  worker: workerSchema,
  limit: limitSchema.optional(),
  run: runSchema.prefault({}),
});

function checkGeometry(s: z.output<typeof baseSchema>, ctx: z.RefinementCtx) {
  const bounds = { x_m: s.room.length_m, y_m: s.room.width_m, z_m: s.room.height_m } as const;
  const inside = (point: Record<keyof typeof bounds, number>, path: (string | number)[], what: string) => {
    for (const axis of Object.keys(bounds) as (keyof typeof bounds)[]) {
      const v = point[axis];
      if (v < 0 || v > bounds[axis]) {
        ctx.addIssue({
          code: 'custom',
          path: [...path, axis],
          input: v,
          message: `${what} must lie inside the room (0 to ${bounds[axis]} m), got ${v}`,
        });
      }
    }
  };
  inside(s.source, ['source'], 'source');
  inside(s.worker, ['worker'], 'breathing-zone centre');
  const nonZero = (d: z.output<typeof directionSchema>, path: (string | number)[]) => {
    const length = 'x' in d ? Math.hypot(d.x, d.y, d.z) : 1;
    if (!(length > 1e-9)) {
      ctx.addIssue({
        code: 'custom',
        path: [...path, 'direction'],
        input: d,
        message: `direction must be a non-zero vector, got ${JSON.stringify(d)}`,
      });
    }
  };
  s.hoods.forEach((hood, i) => {
    inside(hood, ['hoods', i], 'hood face centre');
    nonZero(hood.direction, ['hoods', i]);
  });
  if (s.source.jet?.direction) nonZero(s.source.jet.direction, ['source', 'jet']);
  const profile = s.dust.sizeProfile;
  if (profile.kind === 'bins') {
    if (profile.amounts.length !== profile.edges_m.length - 1) {
      ctx.addIssue({
        code: 'custom',
        path: ['dust', 'sizeProfile', 'amounts'],
        input: profile.amounts.length,
        message: `amounts needs one value per bin (${profile.edges_m.length - 1}), got ${profile.amounts.length}`,
      });
    }
    profile.edges_m.forEach((edge, i) => {
      if (i > 0 && !(edge > profile.edges_m[i - 1])) {
        ctx.addIssue({
          code: 'custom',
          path: ['dust', 'sizeProfile', 'edges_m', i],
          input: edge,
          message: `edges_m must increase, got ${edge} after ${profile.edges_m[i - 1]}`,
        });
      }
    });
    if (!profile.amounts.some((a) => a > 0)) {
      ctx.addIssue({
        code: 'custom',
        path: ['dust', 'sizeProfile', 'amounts'],
        input: profile.amounts,
        message: 'amounts must hold at least one positive value',
      });
    }
  }
}

const checkedSchema = baseSchema.superRefine(checkGeometry);

// Files and stored rows written before the release type moved to the source still read.
export const scenarioSchema = z.preprocess(upgradeScenario, checkedSchema);
/** The fields with their defaults, for forms that show what a blank field becomes. */
export const scenarioFields = baseSchema.shape;

export type Scenario = z.output<typeof checkedSchema>;
export type ScenarioInput = z.input<typeof checkedSchema>;
export type ReleaseType = (typeof RELEASE_TYPES)[number];
export type Jet = NonNullable<Scenario['source']['jet']>;
export type Hood = Scenario['hoods'][number];
export type RunPrecision = NonNullable<Scenario['run']['precision']>;

function describe(value: unknown): string {
  if (typeof value === 'number') return String(value);
  if (value === undefined) return 'nothing';
  const text = JSON.stringify(value);
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

export class ScenarioError extends Error {
  constructor(readonly issues: { path: string; message: string }[]) {
    super(`Invalid scenario:\n${issues.map((i) => `  ${i.path}: ${i.message}`).join('\n')}`);
    this.name = 'ScenarioError';
  }
}

// zod's default messages omit the offending value; the user needs both the field and the value.
export function parseScenario(input: unknown): Scenario {
  const result = scenarioSchema.safeParse(input, { reportInput: true });
  if (result.success) return result.data;
  const issues = result.error.issues.map((issue) => {
    const missing = issue.code === 'invalid_type' && issue.input === undefined;
    const message = issue.code === 'custom' ? issue.message : missing ? 'is required' : `${issue.message}, got ${describe(issue.input)}`;
    return { path: issue.path.join('.') || '(root)', message };
  });
  throw new ScenarioError(issues);
}
