import { z } from 'zod';
import { runResultSchema } from './run-result';
import { scenarioSchema } from './scenario';

export { runResultSchema };

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
  if (ArrayBuffer.isView(value) && !(value instanceof DataView))
    return Array.from(value as unknown as ArrayLike<number>, (v) => (Number.isFinite(v) ? v : null));
  if (Array.isArray(value)) return value.map(toJsonFriendly);
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, toJsonFriendly(v)]));
  if (typeof value === 'number' && !Number.isFinite(value)) return null;
  return value;
}
