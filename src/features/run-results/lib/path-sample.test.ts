import { describe, expect, it } from 'vitest';
import { buildPaths, busiestTime_s, fateCounts, pathBetween, positionAt } from './path-sample';

// Invented sample in the engine's layout: frames every 10 s, [particle][frame][xyz], ends [released_s, xyz, ended_s, xyz].
const N = NaN;
const sample = {
  particles: 3,
  frames: 3,
  frameInterval_s: 10,
  positions_m: Float32Array.from([N, N, N, 1, 1, 1, 2, 1, 1, N, N, N, N, N, N, N, N, N, 9, 9, 9, 9, 9, 9, 9, 9, 9]),
  bins: Int32Array.from([4, 2, -1]),
  fates: Int32Array.from([3, 0, -1]),
  ends: Float32Array.from([5, 0, 1, 1, 30, 3, 1, 1, 12, 4, 4, 1, 13, 4, 5, 1, N, N, N, N, N, N, N, N]),
};

describe('path sample', () => {
  const paths = buildPaths(sample);

  it('starts each path at its release, runs through its frames and closes at its end', () => {
    expect(paths.map((p) => p.slot)).toEqual([0, 1]);
    expect(Array.from(paths[0].times_s)).toEqual([5, 10, 20, 30]);
    expect(paths[0].fate).toBe(3);
    // Captured between two frames: no frame at all, yet release and end still make a path.
    expect(Array.from(paths[1].times_s)).toEqual([12, 13]);
  });

  it('places a particle between known positions in a straight line, and nowhere outside its life', () => {
    expect(positionAt(paths[0], 4)).toBeUndefined();
    expect(positionAt(paths[0], 7.5)).toEqual([0.5, 1, 1]);
    expect(positionAt(paths[0], 25)).toEqual([2.5, 1, 1]);
    expect(positionAt(paths[0], 30.5)).toBeUndefined();
    expect(positionAt(paths[1], 12.5)).toEqual([4, 4.5, 1]);
  });

  it('gives a tail cut at both times and empty once the particle has gone', () => {
    expect(pathBetween(paths[0], 15, 25)).toEqual([
      [1.5, 1, 1],
      [2, 1, 1],
      [2.5, 1, 1],
    ]);
    expect(pathBetween(paths[1], 0, 40)).toEqual([
      [4, 4, 1],
      [4, 5, 1],
    ]);
    expect(pathBetween(paths[1], 14, 40)).toEqual([]);
  });

  it('reads an older sample without ends from its frames, and counts fates it does not know apart', () => {
    const old = buildPaths({ ...sample, ends: undefined, fates: undefined });
    expect(Array.from(old[0].times_s)).toEqual([10, 20]);
    expect(old).toHaveLength(1);
    expect(fateCounts(old)).toEqual([0, 0, 0, 0, 1]);
    expect(fateCounts(paths)).toEqual([1, 0, 0, 1, 0]);
  });

  it('opens the animation at the frame with the most particles airborne, the earliest of a tie, never before t = 0', () => {
    // At 0 s nothing is out; at 10 and 20 s the first particle is; the second lives only from 12 to 13 s.
    expect(busiestTime_s(paths, 30, 10)).toBe(10);
    // With frames every 0.5 s the 12 s frame is the first to catch both.
    expect(busiestTime_s(paths, 30, 0.5)).toBe(12);
    expect(busiestTime_s([], 30, 10)).toBe(0);
    expect(busiestTime_s(paths, 0, 10)).toBe(0);
  });
});
