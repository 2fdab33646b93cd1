import { describe, expect, it } from 'vitest';
import { countText, percentText } from './figures';

describe('percentText', () => {
  it('gives three significant digits, so 147 % and 0.52 % keep the digits that matter', () => {
    expect(percentText(147.2)).toBe('147 %');
    expect(percentText(0.5234)).toBe('0.523 %');
    expect(percentText(49.96)).toBe('50.0 %');
  });
  it('shows a dash for a missing figure', () => {
    expect(percentText(null)).toBe('—');
    expect(percentText(undefined)).toBe('—');
    expect(percentText(Number.NaN)).toBe('—');
  });
});

describe('countText', () => {
  // en-GB groups thousands with commas (CLDR en-GB number symbols).
  it('groups thousands with commas and shows whole counts', () => {
    expect(countText(1260)).toBe('1,260');
    expect(countText(2_000_000)).toBe('2,000,000');
    expect(countText(99.6)).toBe('100');
  });
});
