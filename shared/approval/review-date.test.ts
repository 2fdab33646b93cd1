import { describe, expect, it } from 'vitest';
import { reviewDueDate } from './review-date';

// Expected dates counted on the Gregorian calendar by hand (2028 is a leap year, 2027 is not).
describe('reviewDueDate', () => {
  it('gives 12 months after a Clear or Act result and when there is no banner', () => {
    expect(reviewDueDate('clear', new Date('2027-03-15T10:00:00Z'))).toBe('2028-03-15');
    expect(reviewDueDate('act', new Date('2027-03-15T10:00:00Z'))).toBe('2028-03-15');
    expect(reviewDueDate(null, new Date('2027-12-01T00:00:00Z'))).toBe('2028-12-01');
  });
  it('gives 6 months after a Watch result, across the year end', () => {
    expect(reviewDueDate('watch', new Date('2027-09-10T23:59:00Z'))).toBe('2028-03-10');
  });
  it('clamps to the last day of a shorter month instead of running into the next', () => {
    expect(reviewDueDate('watch', new Date('2027-08-31T12:00:00Z'))).toBe('2028-02-29');
    expect(reviewDueDate('watch', new Date('2028-08-31T12:00:00Z'))).toBe('2029-02-28');
    expect(reviewDueDate('clear', new Date('2028-02-29T12:00:00Z'))).toBe('2029-02-28');
  });
});
