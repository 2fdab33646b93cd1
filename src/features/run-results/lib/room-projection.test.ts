import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../../../shared/schemas/scenario';
import { scenarioInput } from '../../../../tests/fixtures/workspace';
import { gridStep_m, hoodOutlines, projection } from './room-projection';

const scenario = parseScenario(scenarioInput());

describe('room projection', () => {
  it('draws plan and elevation to one scale with y and z pointing up', () => {
    const plan = projection(scenario.room, 'plan', 640);
    const elevation = projection(scenario.room, 'elevation', 640);
    expect(plan.scale).toBe(80);
    expect(elevation.scale).toBe(plan.scale);
    expect(plan.toSvg(2, 3, 0.9)).toEqual([160, 240]);
    expect(elevation.toSvg(2, 3, 0.9)).toEqual([160, (3 - 0.9) * 80]);
  });

  it('outlines a hood face facing +x as a square in the y–z plane at its centre', () => {
    const [hood] = hoodOutlines(scenario.hoods);
    expect(hood.name).toBe('Hood 1');
    expect(hood.normal).toEqual([1, 0, 0]);
    for (const [x, y, z] of hood.corners) {
      expect(x).toBeCloseTo(1.7, 12);
      expect(Math.abs(y - 3)).toBeCloseTo(0.15, 12);
      expect(Math.abs(z - 0.9)).toBeCloseTo(0.15, 12);
    }
  });

  it('picks a grid step that is one metre unless that gives more than 16 lines', () => {
    expect(gridStep_m(8)).toBe(1);
    expect(gridStep_m(20)).toBe(2);
    expect(gridStep_m(12)).toBe(1);
    expect(gridStep_m(60)).toBe(5);
  });
});
