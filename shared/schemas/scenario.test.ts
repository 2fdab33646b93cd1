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

  it('reads the release type and the jet from the source, and collects on walls unless told not to', () => {
    const s = parseScenario({
      ...valid(),
      source: { ...valid().source, releaseType: 'high', jet: { speed_mPerS: 5, diameter_m: 0.05, direction: { azimuth_deg: -90 } } },
    });
    expect(s.source.releaseType).toBe('high');
    expect(s.source.jet).toEqual({ speed_mPerS: 5, diameter_m: 0.05, direction: { azimuth_deg: -90, elevation_deg: 0 } });
    expect(s.room.wallDeposition).toBe(true);
    expect(parseScenario({ ...valid(), room: { ...valid().room, wallDeposition: false } }).room.wallDeposition).toBe(false);
  });

  it('refuses a jet outside 0-100 m/s and 1 mm-1 m, naming the field and the value', () => {
    const jet = (speed_mPerS: number, diameter_m: number) => ({
      ...valid(),
      source: { ...valid().source, jet: { speed_mPerS, diameter_m } },
    });
    expect(issuesOf(jet(120, 0.05))).toEqual([{ path: 'source.jet.speed_mPerS', message: 'must be 0 to 100 m/s, got 120' }]);
    expect(issuesOf(jet(-1, 0.05))).toEqual([{ path: 'source.jet.speed_mPerS', message: 'must be 0 to 100 m/s, got -1' }]);
    expect(issuesOf(jet(5, 0.0005))).toEqual([{ path: 'source.jet.diameter_m', message: 'must be 1 mm to 1 m, got 0.0005' }]);
    expect(issuesOf(jet(5, 1.5))).toEqual([{ path: 'source.jet.diameter_m', message: 'must be 1 mm to 1 m, got 1.5' }]);
    expect(parseScenario(jet(0, 0.001)).source.jet).toEqual({ speed_mPerS: 0, diameter_m: 0.001 });
  });

  it('refuses a zero jet direction vector', () => {
    const input = { ...valid(), source: { ...valid().source, jet: { speed_mPerS: 5, diameter_m: 0.05, direction: { x: 0, y: 0, z: 0 } } } };
    expect(issuesOf(input)).toEqual([
      { path: 'source.jet.direction', message: 'direction must be a non-zero vector, got {"x":0,"y":0,"z":0}' },
    ]);
  });

  it("moves an old file's hood release type to the source, taking the most demanding when hoods disagree", () => {
    const old = valid();
    const second = { ...old.hoods[0], x_m: 2.2, releaseType: 'active' };
    const s = parseScenario({ ...old, hoods: [{ ...old.hoods[0], releaseType: 'high' }, second] });
    expect(s.source.releaseType).toBe('high');
    expect(s.hoods.every((h) => !('releaseType' in h))).toBe(true);
    expect(
      parseScenario({ ...old, source: { ...old.source, releaseType: 'low' }, hoods: [{ ...old.hoods[0], releaseType: 'high' }] }).source
        .releaseType,
    ).toBe('low');
    expect(parseScenario(old).source.releaseType).toBeUndefined();
  });
});

// Bounds from the hardening issue: what one browser run, the server and a reader can handle (common practice, not physics).
describe('scenario bounds', () => {
  it('accepts a scenario exactly at every bound', () => {
    const s = valid();
    const input = {
      ...s,
      name: 'n'.repeat(200),
      description: 'd'.repeat(200),
      source: { ...s.source, emission: { kind: 'bursts', massPerEvent_mg: 1, eventsPerHour: 2, taskDuration_min: 1440 } },
      hoods: [{ ...s.hoods[0], name: 'h'.repeat(200) }],
      run: { particles: 5_000_000, duration_s: 86_400, seed: 's'.repeat(200) },
    };
    expect(parseScenario(input).run.particles).toBe(5_000_000);
  });

  it('names each field one step past its bound, with the bound in the message', () => {
    const s = valid();
    const input = {
      ...s,
      name: 'n'.repeat(201),
      source: { ...s.source, emission: { kind: 'continuous', rate_mgPerMin: 5, taskDuration_min: 1441 } },
      dust: { ...s.dust, name: 'x'.repeat(201) },
      hoods: [{ ...s.hoods[0], name: 'h'.repeat(201) }],
      limit: { fraction: 'respirable', value_mgPerM3: 0.1, source: 'l'.repeat(201) },
      run: { particles: 5_000_001, duration_s: 86_401 },
    };
    const issues = issuesOf(input);
    expect(issues.map((i) => i.path).sort()).toEqual(
      ['dust.name', 'hoods.0.name', 'limit.source', 'name', 'run.duration_s', 'run.particles', 'source.emission.taskDuration_min'].sort(),
    );
    expect(issues.find((i) => i.path === 'run.particles')!.message).toMatch(/at most 5,000,000/);
    expect(issues.find((i) => i.path === 'run.duration_s')!.message).toMatch(/at most 24 h/);
    expect(issues.find((i) => i.path === 'name')!.message).toMatch(/at most 200 characters/);
  });
});

describe('downdraft bench', () => {
  const bench = (patch: Record<string, unknown> = {}) => {
    const s = valid();
    return { ...s, hoods: [{ ...s.hoods[0], kind: 'downdraft-bench', z_m: 0.85, faceWidth_m: 1.2, faceHeight_m: 0.6, ...patch }] };
  };

  it('faces straight up whatever direction is sent, as a vector or as angles', () => {
    for (const direction of [{ azimuth_deg: -90 }, { x: 1, y: 0, z: 0 }, { x: 0, y: 0, z: -3 }, { azimuth_deg: 40, elevation_deg: -90 }]) {
      expect(parseScenario(bench({ direction })).hoods[0].direction).toEqual({ x: 0, y: 0, z: 1 });
    }
  });

  it('keeps the work surface length and depth as sent', () => {
    expect(parseScenario(bench()).hoods[0]).toMatchObject({ kind: 'downdraft-bench', faceWidth_m: 1.2, faceHeight_m: 0.6 });
  });

  it('refuses a work surface of no length or a negative depth, naming the field and the value', () => {
    expect(issuesOf(bench({ faceWidth_m: 0 }))).toEqual([
      expect.objectContaining({ path: 'hoods.0.faceWidth_m', message: expect.stringContaining('got 0') }),
    ]);
    expect(issuesOf(bench({ faceHeight_m: -0.6 }))).toEqual([
      expect.objectContaining({ path: 'hoods.0.faceHeight_m', message: expect.stringContaining('got -0.6') }),
    ]);
  });

  it('leaves the direction of every other kind as sent', () => {
    expect(parseScenario(valid()).hoods[0].direction).toEqual({ azimuth_deg: -90, elevation_deg: 0 });
    const sideways = valid();
    sideways.hoods[0].direction = { x: 1, y: 0, z: 0 } as never;
    expect(parseScenario(sideways).hoods[0].direction).toEqual({ x: 1, y: 0, z: 0 });
  });
});
