import { describe, expect, it } from 'vitest';
import { formatSelection, parseSelection, toggleId } from './selection';

describe('the selection in the link', () => {
  it('reads ids in the link order and drops repeats', () => {
    expect(parseSelection('3,5,7,5')).toEqual({ ids: [3, 5, 7], ignored: [], tooMany: false });
  });

  it('quotes back what is not an id', () => {
    expect(parseSelection('3,x, -2,4.5,,8')).toEqual({ ids: [3, 8], ignored: ['x', '-2', '4.5'], tooMany: false });
  });

  it('flags more than four', () => {
    expect(parseSelection('1,2,3,4,5').tooMany).toBe(true);
    expect(parseSelection(null)).toEqual({ ids: [], ignored: [], tooMany: false });
  });

  it('adds and removes an id and writes it back', () => {
    expect(toggleId([3, 5], 7)).toEqual([3, 5, 7]);
    expect(toggleId([3, 5, 7], 5)).toEqual([3, 7]);
    expect(formatSelection([3, 7])).toBe('3,7');
  });
});
