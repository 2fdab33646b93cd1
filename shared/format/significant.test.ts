import { describe, expect, it } from 'vitest';
import { formatSig, trimSig } from './significant';

// Expected strings follow the rounding of Number.prototype.toPrecision (ECMA-262 §21.1.3.5).
describe('formatSig', () => {
  it('rounds to the requested significant digits with plain decimals', () => {
    expect(formatSig(0.000123456, 3)).toBe('0.000123');
    expect(formatSig(3.14159, 3)).toBe('3.14');
    expect(formatSig(123456, 2)).toBe('120000');
    expect(formatSig(-0.0496, 2)).toBe('-0.050');
  });

  it('keeps trailing zeros that are significant', () => {
    expect(formatSig(2.5, 3)).toBe('2.50');
    expect(formatSig(9.996, 3)).toBe('10.0');
  });

  it('switches to exponent notation for very small and very large values', () => {
    expect(formatSig(1.234e-7, 3)).toBe('1.23e-7');
    expect(formatSig(6.02e23, 2)).toBe('6.0e+23');
  });

  it('writes zero, infinities and NaN readably', () => {
    expect(formatSig(0, 3)).toBe('0');
    expect(formatSig(Infinity, 3)).toBe('∞');
    expect(formatSig(-Infinity, 3)).toBe('−∞');
    expect(formatSig(NaN, 3)).toBe('NaN');
  });

  it('rejects a digit count that is not a positive integer, quoting it', () => {
    expect(() => formatSig(1, 0)).toThrow(/digits.*got 0/);
    expect(() => formatSig(1, 2.5)).toThrow(RangeError);
  });
});

describe('trimSig', () => {
  it('rounds like toPrecision and drops the zeros a typed figure never had', () => {
    expect(trimSig(293.15 - 273.15, 6)).toBe('20');
    expect(trimSig(0.30000000000000004, 6)).toBe('0.3');
    expect(trimSig(1234.5, 3)).toBe('1230');
  });
});
