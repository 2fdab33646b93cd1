import type { Banner } from '../vocabulary/fractions';

/** Months until an approved control is looked at again: a Watch result is close enough to the limit to earn a shorter look. */
export const reviewMonthsFor = (banner: Banner | null): number => (banner === 'watch' ? 6 : 12);

// Calendar months, clamped to the month's last day: 31 August + 6 months is 28 February, never 3 March,
// so a review is never due later than the rule says.
export function reviewDueDate(banner: Banner | null, approvedAt: Date): string {
  const year = approvedAt.getUTCFullYear();
  const month = approvedAt.getUTCMonth() + reviewMonthsFor(banner);
  const lastDay = new Date(Date.UTC(year, month + 1, 0)).getUTCDate();
  return new Date(Date.UTC(year, month, Math.min(approvedAt.getUTCDate(), lastDay))).toISOString().slice(0, 10);
}
