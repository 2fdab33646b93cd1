import { describe, expect, it } from 'vitest';
import { powerOfTen, readableNumber } from './readable';

// The × 10ⁿ form is the SI Brochure's (9th ed., §5.4.3) way of writing a power of ten.
describe('readableNumber', () => {
  it('writes small and large values as a mantissa times a power of ten', () => {
    expect(readableNumber(2.7e-5, 3)).toBe('2.70 × 10⁻⁵');
    expect(readableNumber(6.02e23, 2)).toBe('6.0 × 10²³');
  });
  it('keeps plain decimals plain and shows a dash for a missing figure', () => {
    expect(readableNumber(0.0123456)).toBe('0.0123');
    expect(readableNumber(Number.NaN)).toBe('—');
    expect(readableNumber(Infinity)).toBe('—');
  });
});

describe('powerOfTen', () => {
  it('names decades as 1, 10 and 10ⁿ', () => {
    expect(powerOfTen(1)).toBe('1');
    expect(powerOfTen(10)).toBe('10');
    expect(powerOfTen(1e-5)).toBe('10⁻⁵');
    expect(powerOfTen(1e6)).toBe('10⁶');
  });
});
