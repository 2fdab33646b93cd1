import { describe, expect, it } from 'vitest';
import { advanceFrames, frameDots, frameTime_s, splitAtWrap, trail, visibleFrom } from './trajectory-frames';
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
  it('pick each airborne particle at the frame and skip NaN frames and unused slots', () => {
    expect(frameDots(t, 0)).toEqual([{ slot: 0, bin: 3, x_m: 1, y_m: 2, z_m: 3 }]);
    expect(frameDots(t, 1).map((d) => [d.slot, d.x_m, d.z_m])).toEqual([
      [0, 1.5, 3],
      [1, 4, 0.5],
    ]);
    expect(frameDots(t, 2).map((d) => d.slot)).toEqual([1]);
  });

  it('clamp and round the frame, and give its time in seconds', () => {
    expect(frameDots(t, 7).map((d) => d.slot)).toEqual([1]);
    expect(frameDots(t, 0.6)).toEqual(frameDots(t, 1));
    expect(frameTime_s(t, 2)).toBe(4);
  });

  it('give a tail of the airborne positions up to the frame, oldest first', () => {
    expect(trail(t, 1, 2, 5)).toEqual([
      [4, 5, 0.5],
      [4.5, 5, 0.375],
    ]);
    expect(trail(t, 0, 2, 2)).toEqual([[1.5, 2, 3]]);
  });

  it('hide the frames the engine fills with the release point before a particle is released', () => {
    const waiting = {
      ...t,
      particles: 1,
      positions_m: Float32Array.from([2, 3, 0.875, 2, 3, 0.875, 2.25, 3, 1]),
      bins: Int32Array.from([5]),
    };
    const from = visibleFrom(waiting);
    expect(Array.from(from)).toEqual([1]);
    expect(frameDots(waiting, 0, from)).toEqual([]);
    expect(frameDots(waiting, 1, from)).toHaveLength(1);
    expect(trail(waiting, 0, 2, 5, from)).toEqual([
      [2, 3, 0.875],
      [2.25, 3, 1],
    ]);
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

  it('advance 20 simulated seconds per wall second at 1×', () => {
    expect(advanceFrames(2, 1000, 1)).toBe(10);
    expect(advanceFrames(2, 500, 4)).toBe(20);
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
