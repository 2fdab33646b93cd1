// One style everywhere: the reader's own locale (undefined asks the runtime for it), a medium date and
// a short time, so "2 Dec 2026, 14:05" in London and "Dec 2, 2026, 2:05 PM" in Boston.
const DATE_TIME: Intl.DateTimeFormatOptions = { dateStyle: 'medium', timeStyle: 'short' };
const DATE: Intl.DateTimeFormatOptions = { dateStyle: 'medium' };
const TIME: Intl.DateTimeFormatOptions = { timeStyle: 'short' };

// A calendar date ("2026-12-02", a review date) names a day, not an instant: read it in UTC so a reader
// west of Greenwich does not see the day before.
const CALENDAR_DATE = /^\d{4}-\d{2}-\d{2}$/;

type When = string | Date | null | undefined;

function instant(when: When): Date | null {
  if (when === null || when === undefined || when === '') return null;
  const d = when instanceof Date ? when : new Date(when);
  return Number.isNaN(d.getTime()) ? null : d;
}

/** A moment, as "2 Dec 2026, 14:05" in the reader's locale; a dash when there is none. */
export function dateTimeText(when: When, locale?: string, timeZone?: string): string {
  const d = instant(when);
  return d ? d.toLocaleString(locale, { ...DATE_TIME, timeZone }) : '—';
}

/** A day, as "2 Dec 2026"; calendar dates keep their day whatever the reader's time zone. */
export function dateText(when: When, locale?: string, timeZone?: string): string {
  const d = instant(when);
  if (!d) return '—';
  const zone = typeof when === 'string' && CALENDAR_DATE.test(when) ? 'UTC' : timeZone;
  return d.toLocaleDateString(locale, { ...DATE, timeZone: zone });
}

/** A time of day, as "14:05", for a page that only says when it last looked. */
export function timeText(when: When, locale?: string, timeZone?: string): string {
  const d = instant(when);
  return d ? d.toLocaleTimeString(locale, { ...TIME, timeZone }) : '—';
}

/** The day part of a file name, "2026-12-02", in the reader's own calendar day. */
export function fileDate(when: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${when.getFullYear()}-${pad(when.getMonth() + 1)}-${pad(when.getDate())}`;
}
