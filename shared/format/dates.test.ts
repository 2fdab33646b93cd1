import { describe, expect, it } from 'vitest';
import { dateText, dateTimeText, fileDate, timeText } from './dates';

// Expected strings follow CLDR's medium date and short time patterns for each locale (ECMA-402 Intl.DateTimeFormat);
// newer ICU puts a narrow no-break space before AM/PM, so spaces are compared as plain spaces.
const plain = (s: string) => s.replace(/[\u202f\u00a0]/g, ' ');
const AT = '2026-12-02T14:05:00Z';

describe('dateTimeText', () => {
  it('writes one medium date and short time in the reader’s locale', () => {
    expect(plain(dateTimeText(AT, 'en-GB', 'UTC'))).toBe('2 Dec 2026, 14:05');
    expect(plain(dateTimeText(AT, 'en-US', 'UTC'))).toBe('Dec 2, 2026, 2:05 PM');
    expect(plain(dateTimeText(AT, 'de-DE', 'UTC'))).toBe('02.12.2026, 14:05');
  });
  it('shows the moment in the reader’s time zone', () => {
    expect(plain(dateTimeText(AT, 'en-GB', 'Asia/Tokyo'))).toBe('2 Dec 2026, 23:05');
  });
  it('shows a dash for a missing or unreadable moment, never "Invalid Date"', () => {
    expect(dateTimeText(null)).toBe('—');
    expect(dateTimeText('')).toBe('—');
    expect(dateTimeText('not a date')).toBe('—');
  });
});

describe('dateText', () => {
  it('keeps a calendar date on its day west of Greenwich', () => {
    expect(dateText('2027-06-02', 'en-GB', 'America/Los_Angeles')).toBe('2 Jun 2027');
  });
  it('gives the day of a moment in the reader’s zone', () => {
    expect(dateText('2026-12-02T23:30:00Z', 'en-GB', 'Asia/Tokyo')).toBe('3 Dec 2026');
  });
});

describe('timeText and fileDate', () => {
  it('writes a short time of day', () => {
    expect(plain(timeText(AT, 'en-GB', 'UTC'))).toBe('14:05');
  });
  it('names a file’s day as year-month-day with leading zeros', () => {
    expect(fileDate(new Date(2026, 0, 5, 12))).toBe('2026-01-05');
  });
});
