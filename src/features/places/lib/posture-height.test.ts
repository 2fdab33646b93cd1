import { describe, expect, it } from 'vitest';
import { POSTURE_BREATHING_HEIGHT_m } from '../../../../shared/vocabulary/index';
import { heightForPosture } from './posture-height';

// The typical heights are common practice (shared/vocabulary/postures.ts); the test reads them from there.
const standing = String(POSTURE_BREATHING_HEIGHT_m.standing);
const seated = String(POSTURE_BREATHING_HEIGHT_m.seated);

describe('breathing-zone height on a posture change', () => {
  it('moves the typical standing height to the typical seated one and back', () => {
    expect(heightForPosture(standing, 'standing', 'seated')).toBe(seated);
    expect(heightForPosture(seated, 'seated', 'standing')).toBe(standing);
  });

  it('fills an empty or unreadable height with the typical one', () => {
    expect(heightForPosture('', 'standing', 'seated')).toBe(seated);
    expect(heightForPosture('abc', 'seated', 'standing')).toBe(standing);
  });

  it('keeps a height the person typed themselves', () => {
    expect(heightForPosture('1,62', 'standing', 'seated')).toBe('1,62');
    expect(heightForPosture('1.25', 'seated', 'standing')).toBe('1.25');
  });
});
