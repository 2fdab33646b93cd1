import type { z } from 'zod';
import { type RunResult, runResultSchema } from './run-result';
import { describe } from './run-result-lists';

type Obj = Record<string, unknown>;
const isObj = (v: unknown): v is Obj => !!v && typeof v === 'object' && !Array.isArray(v);

// Engine 1.0.0 first wrote results without sizeBins (they came with 479f57e, still at 1.0.0, so the
// shape, not the version string, tells them apart). The diameters cannot be recovered from the result
// alone; empty lists say "unknown" and views then group particles by bin index.
function upgrade(stored: unknown): unknown {
  if (!isObj(stored) || stored.sizeBins !== undefined) return stored;
  return { ...stored, sizeBins: { aerodynamic_m: [], physical_m: [] } };
}

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let v = root;
  for (const key of path) v = isObj(v) || Array.isArray(v) ? (v as Obj)[key as string] : undefined;
  return v;
}

/** One line per issue: the field's path, what was wrong, and the value found there. */
export function describeIssues(error: z.ZodError, input: unknown): string {
  return error.issues
    .map((i) => {
      const path = i.path.length ? i.path.map(String).join('.') : 'result';
      return i.message.includes(', got ') ? `${path} ${i.message}` : `${path}: ${i.message}, got ${describe(valueAt(input, i.path))}`;
    })
    .join('; ');
}

export class RunResultError extends TypeError {
  override name = 'RunResultError';
}

/** Reads a result of any engine version (engine output or stored JSON) into the current shape, keeping its engine.version. */
export function parseRunResult(input: unknown): RunResult {
  const upgraded = upgrade(input);
  const parsed = runResultSchema.safeParse(upgraded);
  if (!parsed.success) throw new RunResultError(describeIssues(parsed.error, upgraded));
  return parsed.data;
}
