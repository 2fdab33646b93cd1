// JSON turns NaN and ±Infinity into null, and JSON.stringify of a typed array gives {"0":…,"1":…};
// every reader below accepts all three shapes so a saved run and a fresh one render alike.

export function toNumber(value: unknown): number {
  return typeof value === 'number' ? value : NaN;
}

function entries(value: unknown): ArrayLike<unknown> | undefined {
  if (Array.isArray(value)) return value;
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) return value as unknown as ArrayLike<number>;
  if (value && typeof value === 'object') {
    const record = value as Record<string, unknown>;
    const keys = Object.keys(record);
    if (keys.length > 0 && keys.every((k, i) => k === String(i))) return keys.map((k) => record[k]);
  }
  return undefined;
}

export function toNumberArray(value: unknown, path: string): number[] {
  const list = entries(value);
  if (!list) throw new TypeError(`${path} must be a list of numbers, got ${describe(value)}`);
  return Array.from(list, toNumber);
}

export function toFloat32(value: unknown, path: string): Float32Array {
  if (value instanceof Float32Array) return value;
  return Float32Array.from(toNumberArray(value, path));
}

export function toInt32(value: unknown, path: string): Int32Array {
  if (value instanceof Int32Array) return value;
  return Int32Array.from(toNumberArray(value, path), (v) => (Number.isFinite(v) ? v : -1));
}

export function describe(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (typeof value === 'number' || typeof value === 'string') return JSON.stringify(value);
  const text = JSON.stringify(value) ?? String(value);
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}
