import { describe, expect, it } from 'vitest';
import { HOOD_KINDS, hoodKindLabel, isBenchKind, isSlotKind } from './hood-kinds';

describe('hood kinds', () => {
  // ACGIH Industrial Ventilation manual: a slot is an opening with width/length ≤ 0.2, plain or flanged.
  it('count the plain and flanged slots as slots and nothing else', () => {
    expect(isSlotKind('slot')).toBe(true);
    expect(isSlotKind('flanged-slot')).toBe(true);
    expect(isSlotKind('flanged')).toBe(false);
    expect(isSlotKind('booth')).toBe(false);
    expect(isSlotKind('downdraft-bench')).toBe(false);
  });
  it('count the downdraft bench as a bench and nothing else', () => {
    expect(HOOD_KINDS.filter(isBenchKind)).toEqual(['downdraft-bench']);
  });
  it('name a kind once, and keep an unknown stored kind readable', () => {
    expect(hoodKindLabel('flanged-slot')).toBe('Flanged slot');
    expect(hoodKindLabel('downdraft-bench')).toBe('Downdraft bench');
    expect(hoodKindLabel('canopy')).toBe('canopy');
  });
});
