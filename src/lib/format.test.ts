import { describe, expect, it } from 'vitest';
import { sig } from './format';

describe('sig', () => {
  it('keeps three significant digits in the readable range', () => {
    expect(sig(0.0123456)).toBe('0.0123');
    expect(sig(1234.5)).toBe('1230');
  });
  it('switches to exponent form for very small or large values', () => {
    expect(sig(3.48e-5)).toBe('3.48e-5');
    expect(sig(2.5e7)).toBe('2.50e+7');
  });
  it('shows a dash for missing or non-finite values', () => {
    expect(sig(null)).toBe('—');
    expect(sig(Number.NaN)).toBe('—');
  });
});
