import { describe, expect, it } from 'vitest';
import { clampZoom, fitPoints, gridSpacing_m, MAX_ZOOM, panBy, stepsWithin, wholeRoom, windowOf, zoomBy } from './view-zoom';

// An invented 20 × 10 m hall with a bench near one corner.
const hall = { a_m: 20, b_m: 10 };

describe('view zoom', () => {
  it('shows the whole room at zoom 1 and keeps the window inside the room', () => {
    expect(windowOf(wholeRoom(hall), hall)).toEqual({ a0_m: 0, a1_m: 20, b0_m: 0, b1_m: 10 });
    expect(windowOf({ k: 4, ca_m: 0, cb_m: 100 }, hall)).toEqual({ a0_m: 0, a1_m: 5, b0_m: 7.5, b1_m: 10 });
    expect(clampZoom({ k: 0.2, ca_m: 3, cb_m: 3 }, hall)).toEqual(wholeRoom(hall));
    expect(clampZoom({ k: 1000, ca_m: 3, cb_m: 3 }, hall).k).toBe(MAX_ZOOM);
  });

  it('zooms to the workstation with room to spare, keeping the room’s proportions', () => {
    const z = fitPoints(
      [
        { a_m: 2, b_m: 2 },
        { a_m: 3, b_m: 2.5 },
      ],
      hall,
      0.5,
    );
    const w = windowOf(z, hall);
    expect(w.a0_m).toBeLessThanOrEqual(1.5);
    expect(w.a1_m).toBeGreaterThanOrEqual(3.5);
    expect(w.b0_m).toBeLessThanOrEqual(1.5);
    expect(w.b1_m).toBeGreaterThanOrEqual(3);
    expect((w.a1_m - w.a0_m) / (w.b1_m - w.b0_m)).toBeCloseTo(2, 12);
    expect(z.k).toBeCloseTo(10 / 1.5, 12);
  });

  it('keeps the point under the pointer in place when zooming about it', () => {
    const start = { k: 2, ca_m: 10, cb_m: 5 };
    const anchor = { a_m: 12, b_m: 6 };
    const before = windowOf(start, hall);
    const after = windowOf(zoomBy(start, 2, hall, anchor), hall);
    const share = (w: typeof before) => [(anchor.a_m - w.a0_m) / (w.a1_m - w.a0_m), (anchor.b_m - w.b0_m) / (w.b1_m - w.b0_m)];
    expect(share(after)[0]).toBeCloseTo(share(before)[0], 12);
    expect(share(after)[1]).toBeCloseTo(share(before)[1], 12);
    expect(after.a1_m - after.a0_m).toBeCloseTo(5, 12);
  });

  it('pans by metres and stops at the walls', () => {
    expect(panBy({ k: 2, ca_m: 10, cb_m: 5 }, 1, -0.5, hall)).toEqual({ k: 2, ca_m: 11, cb_m: 4.5 });
    expect(panBy({ k: 2, ca_m: 10, cb_m: 5 }, 100, 0, hall).ca_m).toBe(15);
  });

  it('picks a grid spacing that keeps lines apart and lists the multiples inside a window', () => {
    expect(gridSpacing_m(32, 40)).toBe(2);
    expect(gridSpacing_m(400, 40)).toBe(0.1);
    expect(stepsWithin(0.25, 0.75, 0.1)).toEqual([0.3, 0.4, 0.5, 0.6, 0.7]);
    expect(stepsWithin(0, 2, 1)).toEqual([0, 1, 2]);
  });
});
