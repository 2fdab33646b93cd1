type Plain = Record<string, unknown>;
export type FieldDifference = { path: string; mine: unknown; saved: unknown };

const isPlain = (v: unknown): v is Plain => typeof v === 'object' && v !== null && !Array.isArray(v);

// Leaf by leaf, the fields where what the person typed and what is stored now disagree.
export function recordDiff(mine: unknown, saved: unknown, path = ''): FieldDifference[] {
  if (JSON.stringify(mine ?? null) === JSON.stringify(saved ?? null)) return [];
  if (isPlain(mine) && isPlain(saved)) {
    const keys = new Set([...Object.keys(mine), ...Object.keys(saved)]);
    return [...keys].flatMap((k) => recordDiff(mine[k], saved[k], path ? `${path}.${k}` : k));
  }
  return [{ path, mine: mine ?? null, saved: saved ?? null }];
}
