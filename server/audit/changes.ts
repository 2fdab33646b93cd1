import type { AuditChange } from '../../shared/schemas/workspace-views';

// Enough to say what an edit did without copying a whole scenario into every entry.
const MAX_CHANGES = 25;

type Leaf = string | number | boolean | null;

function leaves(value: unknown, path: string, out: Map<string, Leaf>): void {
  if (value === undefined) return;
  if (value === null || typeof value !== 'object') {
    out.set(path, value as Leaf);
    return;
  }
  const entries = Array.isArray(value) ? value.map((v, i) => [String(i + 1), v] as const) : Object.entries(value);
  if (entries.length === 0) out.set(path, null);
  for (const [k, v] of entries) leaves(v, path ? `${path}.${k}` : k, out);
}

/**
 * The fields an edit changed, as dotted paths (list items counted from 1) with their old and new values;
 * a field the edit left out is not a change. Lists that grew or shrank show the added or removed items' fields.
 */
export function changesOf(before: unknown, after: unknown): AuditChange[] {
  const was = new Map<string, Leaf>();
  const now = new Map<string, Leaf>();
  leaves(before, '', was);
  leaves(after, '', now);
  const changes: AuditChange[] = [];
  for (const field of new Set([...was.keys(), ...now.keys()])) {
    const from = was.has(field) ? was.get(field)! : null;
    const to = now.has(field) ? now.get(field)! : null;
    if (from !== to && changes.length < MAX_CHANGES) changes.push({ field, from, to });
  }
  return changes;
}

/** Only the keys the patch carries: a partial update changes nothing it leaves out. */
export function changesOfPatch<T extends object>(before: T, patch: Partial<T>): AuditChange[] {
  // A field the stored record does not carry has no known old value, so it is not reported as changed.
  const keys = Object.keys(patch).filter((k) => patch[k as keyof T] !== undefined && k in before) as (keyof T)[];
  const pick = (o: Partial<T>) => Object.fromEntries(keys.map((k) => [k, o[k]]));
  return changesOf(pick(before), pick(patch));
}
