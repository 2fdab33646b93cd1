import { formatSig } from './significant';

/** A value already in percent (e.g. % of limit), to three significant digits everywhere it is shown. */
export const percentText = (value_pct: number | null | undefined, digits = 3): string =>
  value_pct === null || value_pct === undefined || !Number.isFinite(value_pct) ? '—' : `${formatSig(value_pct, digits)} %`;

// One grouping style for counts, whatever the browser's locale: "1,260", as the tests and the report expect.
export const countText = (count: number): string => Math.round(count).toLocaleString('en-GB');
