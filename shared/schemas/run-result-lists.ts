import { z } from 'zod';

// A result reaches a reader in three spellings of the same list: typed arrays straight from the engine,
// plain arrays from toJsonFriendly (null where the engine had NaN), and {"0":…,"1":…} where a typed
// array went through JSON.stringify untouched. Every reader here takes all three, checking the whole
// list in one pass instead of one zod node per element, since a trajectory sample holds ~10⁵ numbers.

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

export function describe(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (typeof value === 'number' || typeof value === 'string') return JSON.stringify(value);
  const text = JSON.stringify(value) ?? String(value);
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

function readList(value: unknown, ctx: z.RefinementCtx): number[] | undefined {
  const list = entries(value);
  if (!list) {
    ctx.addIssue({ code: 'custom', message: `must be a list of numbers, got ${describe(value)}`, input: value });
    return undefined;
  }
  const out = new Array<number>(list.length);
  for (let i = 0; i < list.length; i++) {
    const v = list[i];
    if (v === null) out[i] = NaN;
    else if (typeof v === 'number') out[i] = v;
    else {
      ctx.addIssue({ code: 'custom', message: `must hold numbers, got ${describe(v)}`, input: value, path: [i] });
      return undefined;
    }
  }
  return out;
}

/** A JSON number, or null where JSON dropped a NaN or an infinity. */
export const measured = z.union([z.number(), z.null().transform(() => NaN)]);

export const numberList = z.unknown().transform((value, ctx) => readList(value, ctx) ?? z.NEVER);

export const float32List = z.unknown().transform((value, ctx) => {
  if (value instanceof Float32Array) return value;
  const list = readList(value, ctx);
  return list ? Float32Array.from(list) : z.NEVER;
});

/** Integers; a null reads as −1, the engine's mark for an unused slot. */
export const int32List = z.unknown().transform((value, ctx) => {
  if (value instanceof Int32Array) return value;
  const list = readList(value, ctx);
  if (!list) return z.NEVER;
  const bad = list.findIndex((v) => !Number.isNaN(v) && !Number.isInteger(v));
  if (bad >= 0) {
    ctx.addIssue({ code: 'custom', message: `must hold integers, got ${describe(list[bad])}`, input: value, path: [bad] });
    return z.NEVER;
  }
  return Int32Array.from(list, (v) => (Number.isNaN(v) ? -1 : v));
});

export const pair = z.tuple([measured, measured]);
