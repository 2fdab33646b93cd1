import { describe, expect, it } from 'vitest';
import { buildSweepPoints, distanceRange_m, sourceDistance_m, sweepValues } from './sweep-points';
import { stoneBench } from './test-scenario.test-helper';

const scenario = stoneBench();
const inside = (v: number, size: number) => v >= 0 && v <= size;
const withoutHoods = (s: typeof scenario) => ({ ...s, hoods: [] });

describe('sweep points', () => {
  it('spaces the values evenly with both ends exactly as typed', () => {
    expect(sweepValues(0.1, 0.4, 4)).toEqual([0.1, 0.2, 0.30000000000000004, 0.4]);
    expect(sweepValues(0.1, 0.7, 7).at(-1)).toBe(0.7);
    expect(() => sweepValues(0.1, 0.4, 2)).toThrow(/from 3 to 12, got 2/);
    expect(() => sweepValues(0.1, 0.4, 13)).toThrow(/got 13/);
    expect(() => sweepValues(0.3, 0.3, 3)).toThrow(/two different numbers/);
  });

  it('measures the demo hood 0.3 m from the source along its axis', () => {
    expect(sourceDistance_m(scenario, 0)).toBeCloseTo(0.3, 12);
  });

  it('moves the face along its axis so each point sits at exactly the swept distance, inside the room', () => {
    const points = buildSweepPoints(scenario, { hoodIndex: 0, parameter: 'distance', from: 0.1, to: 0.6, count: 6 });
    points.forEach((p) => {
      expect(sourceDistance_m(p.scenario, 0)).toBeCloseTo(p.value, 12);
      const h = p.scenario.hoods[0];
      expect(inside(h.x_m, scenario.room.length_m) && inside(h.y_m, scenario.room.width_m) && inside(h.z_m, scenario.room.height_m)).toBe(
        true,
      );
      // The hood faces −y, so only y changes: the offset from the axis is kept.
      expect(h.x_m).toBeCloseTo(scenario.hoods[0].x_m, 12);
      expect(h.z_m).toBeCloseTo(scenario.hoods[0].z_m, 12);
      expect(h.direction).toEqual(scenario.hoods[0].direction);
    });
    expect(points.map((p) => p.scenario.hoods[0].y_m.toFixed(3))).toEqual(['3.100', '3.200', '3.300', '3.400', '3.500', '3.600']);
  });

  it('refuses a distance that would push the face through the wall, and says how far it may go', () => {
    // The face is at y = 3.3 m in a 6 m wide room facing −y, so it can back off at most 3 m from the source.
    const [lo, hi] = distanceRange_m(scenario, 0);
    expect(lo).toBeCloseTo(0.02, 12);
    expect(hi).toBeCloseTo(3, 12);
    expect(() => buildSweepPoints(scenario, { hoodIndex: 0, parameter: 'distance', from: 0.5, to: 3.5, count: 3 })).toThrow(
      /outside the room; keep it between 0.020 and 3.000 m/,
    );
  });

  it('keeps the seed and every other input identical; only the swept field changes', () => {
    for (const [parameter, from, to] of [
      ['distance', 0.2, 0.5],
      ['airflow', 0.2, 0.8],
      ['faceScale', 0.5, 2],
    ] as const) {
      const points = buildSweepPoints(scenario, { hoodIndex: 0, parameter, from, to, count: 4 });
      points.forEach((p) => {
        expect(p.scenario.run).toEqual(scenario.run);
        expect(withoutHoods(p.scenario)).toEqual(withoutHoods(scenario));
      });
    }
    const airflow = buildSweepPoints(scenario, { hoodIndex: 0, parameter: 'airflow', from: 0.2, to: 0.8, count: 3 });
    expect(airflow.map((p) => p.scenario.hoods[0].airflow_m3PerS)).toEqual([0.2, 0.5, 0.8]);
    expect({ ...airflow[0].scenario.hoods[0], airflow_m3PerS: 0 }).toEqual({ ...scenario.hoods[0], airflow_m3PerS: 0 });
  });

  it('scales the face width and height together', () => {
    const [half, , double] = buildSweepPoints(scenario, { hoodIndex: 0, parameter: 'faceScale', from: 0.5, to: 2, count: 3 }).map(
      (p) => p.scenario.hoods[0],
    );
    expect([half.faceWidth_m, half.faceHeight_m]).toEqual([0.175, 0.125]);
    expect([double.faceWidth_m, double.faceHeight_m]).toEqual([0.7, 0.5]);
    expect(scenario.hoods[0].faceWidth_m).toBe(0.35);
  });

  it('names a missing hood and a non-positive value', () => {
    expect(() => buildSweepPoints(scenario, { hoodIndex: 3, parameter: 'airflow', from: 0.1, to: 0.2, count: 3 })).toThrow(
      /1 hoods, got 3/,
    );
    expect(() => buildSweepPoints(scenario, { hoodIndex: 0, parameter: 'airflow', from: 0, to: 0.2, count: 3 })).toThrow(
      /above zero, got 0/,
    );
  });
});
