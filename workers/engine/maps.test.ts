import { describe, expect, it } from 'vitest';
import { prepareTest } from './engine.test-helper';
import { captureVelocityMap, captureVelocityNearMap } from './maps';
import { workstation } from './workstation.test-helper';

describe('capture-velocity close-up', () => {
  const p = prepareTest(workstation);
  const room = captureVelocityMap(p);
  const near = captureVelocityNearMap(p)!;
  const hood = workstation.hoods[0];

  it('covers the source, the hood and the breathing zone with cells finer than the whole-room map', () => {
    const [x0, y0] = near.origin_m;
    const x1 = x0 + near.nx * near.cell_m[0];
    const y1 = y0 + near.ny * near.cell_m[1];
    for (const [x, y] of [
      [workstation.source.x_m, workstation.source.y_m],
      [hood.x_m, hood.y_m],
      [workstation.worker.x_m, workstation.worker.y_m],
    ]) {
      expect(x).toBeGreaterThan(x0);
      expect(x).toBeLessThan(x1);
      expect(y).toBeGreaterThan(y0);
      expect(y).toBeLessThan(y1);
    }
    expect(near.cell_m[0]).toBeLessThan(room.cell_m[0] / 2);
    expect(near.height_m).toBe(room.height_m);
  });

  // Air speed rises towards a suction opening (Dalla Valle's centre-line relation, from memory): the fastest cell sits at the face.
  it('is fastest at the hood face', () => {
    let best = 0;
    for (let i = 1; i < near.values.length; i++) if (near.values[i] > near.values[best]) best = i;
    const ix = Math.floor(best / near.ny);
    const iy = best % near.ny;
    const x = near.origin_m[0] + (ix + 0.5) * near.cell_m[0];
    const y = near.origin_m[1] + (iy + 0.5) * near.cell_m[1];
    expect(Math.hypot(x - hood.x_m, y - hood.y_m)).toBeLessThan(0.3);
  });

  it('is absent without hoods', () => {
    expect(captureVelocityNearMap(prepareTest({ ...workstation, hoods: [] }))).toBeUndefined();
  });
});
