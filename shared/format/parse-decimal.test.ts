import { describe, expect, it } from 'vitest';
import { decimalOrNaN, parseDecimal } from './parse-decimal';

// Decimal sign and digit grouping as ISO 80000-1:2009 §7.3.1 and the SI Brochure (9th ed., §5.4.4) allow them.
describe('parseDecimal', () => {
  it('reads a decimal comma and a decimal point alike', () => {
    expect(parseDecimal('0,5')).toBe(0.5);
    expect(parseDecimal('0.5')).toBe(0.5);
    expect(parseDecimal(' 12,75 ')).toBe(12.75);
    expect(parseDecimal(',5')).toBe(0.5);
  });
  it('reads digits grouped in threes by a space, no-break space or narrow no-break space', () => {
    expect(parseDecimal('1 000,5')).toBe(1000.5);
    expect(parseDecimal('1\u00a0000.5')).toBe(1000.5);
    expect(parseDecimal('12\u202f345\u202f678')).toBe(12345678);
  });
  it('refuses spaces that do not group digits in threes', () => {
    expect(parseDecimal('1 00')).toBeNull();
    expect(parseDecimal('1 0000')).toBeNull();
    expect(parseDecimal('1 2')).toBeNull();
  });
  it('reads signs, the typographic minus and exponents', () => {
    expect(parseDecimal('−2,5')).toBe(-2.5);
    expect(parseDecimal('-0.25')).toBe(-0.25);
    expect(parseDecimal('2,5e-6')).toBe(2.5e-6);
    expect(parseDecimal('3E4')).toBe(30000);
  });
  it('refuses more than one comma, a comma beside a point, and comma-grouped thousands', () => {
    expect(parseDecimal('1,2,3')).toBeNull();
    expect(parseDecimal('1.000,5')).toBeNull();
    expect(parseDecimal('1,000.5')).toBeNull();
    expect(parseDecimal('1,250')).toBeNull();
    expect(parseDecimal('0,250')).toBe(0.25);
    expect(parseDecimal('1,25')).toBe(1.25);
  });
  it('refuses blanks and text Number() would otherwise accept', () => {
    for (const text of ['', '   ', 'abc', '0x10', '0b11', 'Infinity', '1e999', '5 m', '.', '-']) expect(parseDecimal(text)).toBeNull();
  });
  it('gives NaN for the schema to report where a form wants a number', () => {
    expect(decimalOrNaN('')).toBeNaN();
    expect(decimalOrNaN('0,3')).toBe(0.3);
  });
});
