export const MIN_SELECTED = 2;
export const MAX_SELECTED = 4;

export interface Selection {
  ids: number[];
  /** Parts of the link that are not scenario ids, quoted back to the reader. */
  ignored: string[];
  tooMany: boolean;
}

/** Reads `ids=3,5,7`; repeats collapse, the link's order is kept. */
export function parseSelection(param: string | null): Selection {
  const ids: number[] = [];
  const ignored: string[] = [];
  for (const part of (param ?? '')
    .split(',')
    .map((p) => p.trim())
    .filter(Boolean)) {
    const id = Number(part);
    if (Number.isInteger(id) && id > 0 && /^\d+$/.test(part)) {
      if (!ids.includes(id)) ids.push(id);
    } else ignored.push(part);
  }
  return { ids, ignored, tooMany: ids.length > MAX_SELECTED };
}

export const formatSelection = (ids: readonly number[]) => ids.join(',');

export function toggleId(ids: readonly number[], id: number): number[] {
  return ids.includes(id) ? ids.filter((x) => x !== id) : [...ids, id];
}
