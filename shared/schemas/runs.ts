import { z } from 'zod';
import { runResultSchema } from './run-result';
import { scenarioSchema } from './scenario';

export { runResultSchema };

export const runCreateSchema = z
  .object({
    scenarioVersion: z.number().int().positive(),
    /** The single-use run ticket the server issued with this run's seed (POST …/run-tickets). */
    ticket: z.string().regex(/^[0-9a-f]{32}$/, 'must be a run ticket the server issued'),
    input: scenarioSchema,
    result: runResultSchema,
  })
  .strict();
export type RunCreate = z.infer<typeof runCreateSchema>;

// A float32 widened to a double prints up to 17 digits (0.31 as 0.3100000023841858); the fewest digits
// that read back to the same float32 keep a saved trajectory sample a third of the size.
function shortestFloat32(v: number): number {
  for (let digits = 6; digits < 9; digits++) {
    const short = Number(v.toPrecision(digits));
    if (Math.fround(short) === v) return short;
  }
  return v;
}

/** Asking for a run ticket carries nothing; the server picks the seed. */
export const runTicketRequestSchema = z.object({}).strict();

/** What the server answers: the seed to run with, once, and the engine version it will replay with. */
export type RunTicket = { ticket: string; seed: number; engineVersion: string };

// Typed arrays do not survive JSON.stringify as arrays; turn them into plain lists first.
export function toJsonFriendly<T>(value: T): unknown {
  if (value instanceof Float32Array) return Array.from(value, (v) => (Number.isFinite(v) ? shortestFloat32(v) : null));
  if (ArrayBuffer.isView(value) && !(value instanceof DataView))
    return Array.from(value as unknown as ArrayLike<number>, (v) => (Number.isFinite(v) ? v : null));
  if (Array.isArray(value)) return value.map(toJsonFriendly);
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, toJsonFriendly(v)]));
  if (typeof value === 'number' && !Number.isFinite(value)) return null;
  return value;
}
