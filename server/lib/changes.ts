type Plain = Record<string, unknown>;
export type Changes = Record<string, { from: unknown; to: unknown }>;

const isPlain = (v: unknown): v is Plain => typeof v === 'object' && v !== null && !Array.isArray(v);

function flatten(value: Plain, prefix = '', out: Plain = {}): Plain {
  for (const [k, v] of Object.entries(value)) {
    if (isPlain(v)) flatten(v, `${prefix}${k}.`, out);
    else out[`${prefix}${k}`] = v;
  }
  return out;
}

// What an edit changed, field by field, so the audit trail can say "from → to" without storing whole records.
export function changedFields(before: object, after: object): Changes {
  const a = flatten(before as Plain);
  const b = flatten(after as Plain);
  const out: Changes = {};
  for (const key of new Set([...Object.keys(a), ...Object.keys(b)])) {
    const from = a[key] ?? null;
    const to = b[key] ?? null;
    if (JSON.stringify(from) !== JSON.stringify(to)) out[key] = { from, to };
  }
  return out;
}
