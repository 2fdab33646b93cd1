import { z } from 'zod';
import { scenarioSchema } from './scenario';

const conc = z.number().finite().gte(0);
const ci = z.tuple([z.number().finite(), z.number().finite()]);
const share = z.number().finite().gte(-1e-9).lte(1 + 1e-9);

const fractionSummary = z
  .object({ taskMean_mgPerM3: conc, taskMeanCi95_mgPerM3: ci, twa8h_mgPerM3: conc, twa8hCi95_mgPerM3: ci, peak15min_mgPerM3: conc })
  .loose();

// The summary fields that tables and decisions read are checked; bulky arrays pass through as they are.
export const runResultSchema = z
  .object({
    engine: z.object({ version: z.string().min(1).max(40), seed: z.union([z.number(), z.string()]), particles: z.number().int().positive(), batches: z.number().int().positive() }).loose(),
    breathingZone: z
      .object({
        fractions: z.object({ total: fractionSummary, inhalable: fractionSummary, thoracic: fractionSummary, respirable: fractionSummary }),
        series: z.object({ time_s: z.array(z.number()) }).loose(),
      })
      .loose(),
    fate: z.object({ emitted_mg: conc, captured: share, settled: share, exhausted: share, airborne: share }).loose(),
    limit: z
      .object({
        fraction: z.enum(['total', 'inhalable', 'thoracic', 'respirable']),
        value_mgPerM3: z.number().positive(),
        percentOfLimit: z.number().finite(),
        ratingCategory: z.number().int().min(0).max(4),
        banner: z.enum(['clear', 'watch', 'act']),
      })
      .loose()
      .optional(),
    crossChecks: z.object({}).loose(),
  })
  .loose();
export type RunResultSummary = z.infer<typeof runResultSchema>;

export const runCreateSchema = z
  .object({
    scenarioVersion: z.number().int().positive(),
    input: scenarioSchema,
    result: runResultSchema,
  })
  .strict();
export type RunCreate = z.infer<typeof runCreateSchema>;

// Typed arrays do not survive JSON.stringify as arrays; turn them into plain lists first.
export function toJsonFriendly<T>(value: T): unknown {
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) return Array.from(value as unknown as ArrayLike<number>, (v) => (Number.isFinite(v) ? v : null));
  if (Array.isArray(value)) return value.map(toJsonFriendly);
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, toJsonFriendly(v)]));
  if (typeof value === 'number' && !Number.isFinite(value)) return null;
  return value;
}
