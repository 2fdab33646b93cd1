import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import v120 from '../../tests/fixtures/run-results/engine-1.2.0.json';
import { combineBatches } from '../engine/combine';
import { prepareTest, runAll } from '../engine/engine.test-helper';
import { workstation } from '../engine/workstation.test-helper';
import { parseRunResult } from '../../shared/schemas/run-result-stored';
import { toJsonFriendly } from '../../shared/schemas/runs';

// The 1 MB cap on a stored, compressed result is the product's own rule (issue 16); a no-control room keeps most paths airborne.
const room = { ...workstation, hoods: [], run: { particles: 4000, batches: 4, seed: 9 } };
const fresh = combineBatches(prepareTest(room), runAll(prepareTest(room)));
const json = JSON.stringify(toJsonFriendly(fresh));

describe('trajectory sample in a saved result', () => {
  it('writes positions as short decimals and stays far below 1 MB compressed', () => {
    const positions = JSON.stringify(toJsonFriendly(fresh.trajectories.positions_m));
    expect(/\d\.\d{3,}/.test(positions)).toBe(false);
    expect(positions).toMatch(/\d\.\d\d\b/);
    expect(gzipSync(json).length).toBeLessThan(300_000);
  });

  it('reads back with its fates and path ends', () => {
    const back = parseRunResult(JSON.parse(json));
    expect(back.trajectories.particles).toBe(fresh.trajectories.particles);
    expect(Array.from(back.trajectories.fates!)).toEqual(Array.from(fresh.trajectories.fates!));
    expect(Array.from(back.trajectories.ends!)).toEqual(Array.from(fresh.trajectories.ends!));
    expect(Array.from(back.trajectories.positions_m)).toEqual(Array.from(fresh.trajectories.positions_m));
  });

  it('still reads a stored result from before fates and path ends', () => {
    const old = parseRunResult(v120);
    expect(old.trajectories.fates).toBeUndefined();
    expect(old.trajectories.ends).toBeUndefined();
    expect(old.trajectories.particles).toBe(v120.trajectories.particles);
  });

  it('names the field when the path ends do not match the sample', () => {
    const raw = JSON.parse(json);
    raw.trajectories.ends = raw.trajectories.ends.slice(0, 8);
    expect(() => parseRunResult(raw)).toThrow(/trajectories\.ends must hold 8 numbers per sampled particle/);
  });
});
