import { describe, expect, it } from 'vitest';
import { ciText } from './format';

describe('ciText', () => {
  it('writes an interval as a range with its unit', () => {
    expect(ciText([0.0012, 0.0019], 3, ' mg/m³')).toBe('0.00120–0.00190 mg/m³');
  });
  it('never shows a zero-width interval as a range (the demo slot hood once read "0.001–0.001")', () => {
    expect(ciText([0.001, 0.001], 3, ' mg/m³')).toBe('not known: too few particles reached the zone');
    expect(ciText([0.002, 0.001])).not.toMatch(/–/);
  });
});
