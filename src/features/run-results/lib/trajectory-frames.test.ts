import { describe, expect, it } from 'vitest';
import { advanceTime_s, baseRate_sPerS, splitAtWrap, visibleFrom } from './trajectory-frames';
import { sizeClasses } from './size-classes';

// Three slots (the last unused), three frames, laid out [particle][frame][xyz] as the engine's kernel writes them.
const t = {
  particles: 3,
  frames: 3,
  frameInterval_s: 2,
  positions_m: Float32Array.from([1, 2, 3, 1.5, 2, 3, NaN, NaN, NaN, NaN, NaN, NaN, 4, 5, 0.5, 4.5, 5, 0.375, 9, 9, 9, 9, 9, 9, 9, 9, 9]),
  bins: Int32Array.from([3, 20, -1]),
};

describe('trajectory frames', () => {
  it('hide the frames the engine fills with the release point before a particle is released', () => {
    const waiting = {
      ...t,
      particles: 1,
      positions_m: Float32Array.from([2, 3, 0.875, 2, 3, 0.875, 2.25, 3, 1]),
      bins: Int32Array.from([5]),
    };
    expect(Array.from(visibleFrom(waiting))).toEqual([1]);
    // A particle that moves from its first frame is shown from the start.
    expect(Array.from(visibleFrom(t)).slice(0, 2)).toEqual([0, 0]);
  });

  it('break a tail where the particle wrapped from one end of the room to the other', () => {
    const parts = splitAtWrap(
      [
        [7.5, 3, 1],
        [7.9, 3, 1],
        [0.2, 3, 1],
        [0.6, 3.1, 1],
        [0.9, 3.2, 1],
      ],
      8,
      6,
    );
    expect(parts).toEqual([
      [
        [7.5, 3, 1],
        [7.9, 3, 1],
      ],
      [
        [0.2, 3, 1],
        [0.6, 3.1, 1],
        [0.9, 3.2, 1],
      ],
    ]);
    expect(
      splitAtWrap(
        [
          [1, 1, 1],
          [1.2, 1, 1],
        ],
        8,
        6,
      ),
    ).toHaveLength(1);
  });

  it('play a whole run in about a minute at 1×, at a plain rate, and scale with the speed', () => {
    expect(baseRate_sPerS(3600)).toBe(60);
    expect(baseRate_sPerS(1200)).toBe(20);
    expect(baseRate_sPerS(300)).toBe(5);
    expect(baseRate_sPerS(8 * 3600)).toBe(600);
    expect(advanceTime_s(60, 1000, 1)).toBe(60);
    expect(advanceTime_s(60, 500, 4)).toBe(120);
  });
});

describe('size classes', () => {
  it('group bins at the ISO 7708 respirable and thoracic cut-points when diameters are known', () => {
    const c = sizeClasses(4, [0.5e-6, 3e-6, 6e-6, 40e-6]);
    expect(c.byDiameter).toBe(true);
    expect([0, 1, 2, 3].map(c.classOfBin)).toEqual([0, 1, 2, 4]);
    expect(c.classes[1].label).toBe('1–4 µm aerodynamic');
  });

  it('fall back to bin indices when the result carries no diameters', () => {
    const c = sizeClasses(36);
    expect(c.byDiameter).toBe(false);
    expect(c.classes).toHaveLength(5);
    expect(c.classes[0].label).toBe('size bins 0–7 (smallest)');
    expect(c.classes[4].label).toBe('size bins 32–35 (largest)');
    expect(c.classOfBin(35)).toBe(4);
    expect(c.classOfBin(-1)).toBe(-1);
  });
});
