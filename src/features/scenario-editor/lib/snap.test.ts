import { describe, expect, it } from 'vitest';
import { nudgeFor, nudgeInside, snapInside } from './snap';

describe('snapping and nudging', () => {
  it('snaps to whole 5 cm steps without binary noise', () => {
    expect(snapInside(1.7234, 4)).toBe(1.7);
    expect(snapInside(1.7251, 4)).toBe(1.75);
    expect(snapInside(0.35, 4)).toBe(0.35);
  });

  it('keeps points inside the room, even when its size is not a multiple of the step', () => {
    expect(snapInside(-0.4, 4)).toBe(0);
    expect(snapInside(4.2, 4.12)).toBe(4.12);
  });

  it('nudges by exactly 5 cm and clamps at the walls', () => {
    expect(nudgeInside(1.7, 0.05, 4)).toBe(1.75);
    expect(nudgeInside(3.98, 0.05, 4)).toBe(4);
    expect(nudgeInside(0.02, -0.5, 4)).toBe(0);
  });

  it('maps arrow keys to 5 cm steps and Shift to 50 cm', () => {
    expect(nudgeFor('ArrowRight', false)).toEqual({ da: 0.05, db: 0 });
    expect(nudgeFor('ArrowDown', true)).toEqual({ da: 0, db: -0.5 });
    expect(nudgeFor('Enter', false)).toBeNull();
  });
});
