import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { ScenarioError, parseScenario } from './scenario';

const valid = () => ({
  room: { length_m: 6, width_m: 5, height_m: 3 },
  source: { x_m: 2, y_m: 2, z_m: 0.9, emission: { kind: 'continuous', rate_mgPerMin: 5, taskDuration_min: 30 } },
  dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 8e-6, gsd: 2 } },
  hoods: [
    {
      kind: 'flanged',
      x_m: 2,
      y_m: 2.4,
      z_m: 0.9,
      direction: { azimuth_deg: -90 },
      faceWidth_m: 0.3,
      faceHeight_m: 0.2,
      airflow_m3PerS: 0.2,
    },
  ],
  worker: { x_m: 2, y_m: 1.4, z_m: 1.5 },
});

function issuesOf(input: unknown): { path: string; message: string }[] {
  try {
    parseScenario(input);
  } catch (error) {
    if (error instanceof ScenarioError) return error.issues;
    throw error;
  }
  throw new Error('expected the scenario to be refused');
}

describe('scenario schema', () => {
  it('fills sensible defaults', () => {
    const s = parseScenario(valid());
    expect(s.room.temperature_K).toBe(293.15);
    expect(s.worker.radius_m).toBe(0.3);
    expect(s.run).toMatchObject({ particles: 20000, batches: 10, seed: 1 });
  });

  it('refuses a negative size, naming the field and the value', () => {
    const input = valid();
    input.dust.sizeProfile.median_m = -1e-6;
    expect(issuesOf(input)).toEqual([
      expect.objectContaining({ path: 'dust.sizeProfile.median_m', message: expect.stringContaining('-0.000001') }),
    ]);
  });

  it('refuses a hood outside the room, naming the field and the value', () => {
    const input = valid();
    input.hoods[0].y_m = 7.5;
    expect(issuesOf(input)).toEqual([{ path: 'hoods.0.y_m', message: 'hood face centre must lie inside the room (0 to 5 m), got 7.5' }]);
  });

  it('refuses zero particles', () => {
    expect(issuesOf({ ...valid(), run: { particles: 0 } })).toEqual([
      expect.objectContaining({ path: 'run.particles', message: expect.stringContaining('got 0') }),
    ]);
  });

  it('refuses NaN and infinities', () => {
    const input = valid();
    input.room.length_m = NaN;
    input.source.z_m = Infinity;
    const issues = issuesOf(input);
    expect(issues.map((i) => i.path)).toEqual(['room.length_m', 'source.z_m']);
    expect(issues[0].message).toContain('NaN');
    expect(issues[1].message).toContain('Infinity');
  });

  it('refuses size bins whose counts do not match their edges', () => {
    const input = {
      ...valid(),
      dust: { density_kgPerM3: 1000, sizeProfile: { kind: 'bins', basis: 'mass', edges_m: [1e-6, 2e-6, 1.5e-6], amounts: [1] } },
    };
    expect(issuesOf(input).map((i) => i.path)).toEqual(['dust.sizeProfile.amounts', 'dust.sizeProfile.edges_m.2']);
  });

  it('accepts every demo scenario file', () => {
    const dir = new URL('../demo-scenarios/', import.meta.url);
    const files = readdirSync(dir).filter((f) => f.endsWith('.json'));
    expect(files.length).toBeGreaterThanOrEqual(10);
    for (const f of files) expect(() => parseScenario(JSON.parse(readFileSync(new URL(f, dir), 'utf8')))).not.toThrow();
  });
});
