import { describe, expect, it } from 'vitest';
import { ciText, NO_WIDTH_TEXT, upperBoundText } from './interval';

describe('ciText', () => {
  it('writes an interval with width as a range with its unit', () => {
    expect(ciText([0.104, 0.148], 3, ' mg/m³')).toBe('0.104–0.148 mg/m³');
  });

  it('never writes a zero-width or broken interval as a range', () => {
    expect(ciText([0.015, 0.015])).toBe(NO_WIDTH_TEXT);
    expect(ciText([0.02, 0.01])).toBe(NO_WIDTH_TEXT);
    expect(ciText([NaN, 1])).toBe(NO_WIDTH_TEXT);
  });

  it('takes the caller’s number format', () => {
    expect(ciText([1, 2], 3, '', (v) => v.toFixed(1))).toBe('1.0–2.0');
  });
});

describe('upperBoundText', () => {
  it('gives the bound when it lies above the estimate, and "not known" when the interval has no width', () => {
    expect(upperBoundText(27.5, 30.3, (v) => `${v} %`)).toBe('30.3 %');
    expect(upperBoundText(0.75, 0.75, (v) => `${v} %`)).toBe('not known');
    expect(upperBoundText(1, NaN, (v) => `${v} %`)).toBe('not known');
  });
});
