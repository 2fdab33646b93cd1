import { readableNumber } from './readable';

/** What an interval with no width says instead of a range: nothing about the error, so it never reads as one. */
export const NO_WIDTH_TEXT = 'not known: too few particles reached the zone';

/** A 95 % interval as "lo–hi" (with `unit`), or NO_WIDTH_TEXT when it has no width (or is not a number). */
export const ciText = ([lo, hi]: readonly [number, number], digits = 3, unit = '', format = readableNumber): string =>
  hi > lo ? `${format(lo, digits)}–${format(hi, digits)}${unit}` : NO_WIDTH_TEXT;

/** An upper 95 % bound as text, or "not known" when it is no higher than the estimate (an interval with no width). */
export const upperBoundText = (estimate: number, upper: number, format: (v: number) => string): string =>
  upperBoundKnown(estimate, upper) ? format(upper) : 'not known';

/** Whether an upper bound says anything: it lies above its estimate (not so for an interval with no width). */
export const upperBoundKnown = (estimate: number, upper: number): boolean => upper > estimate;
