import { describe, expect, it } from 'vitest';
import before from '../../tests/fixtures/run-results/engine-1.0.0-before-size-bins.json';
import v100 from '../../tests/fixtures/run-results/engine-1.0.0.json';
import v120 from '../../tests/fixtures/run-results/engine-1.2.0.json';
import { combineBatches } from '../engine/combine';
import { prepareTest, runAll } from '../engine/engine.test-helper';
import { workstation } from '../engine/workstation.test-helper';
import { ENGINE_VERSION } from '../engine/version';
import { resultsToJson } from './format-results';
import { runResultSchema } from '../../shared/schemas/run-result';
import { parseRunResult } from '../../shared/schemas/run-result-stored';
import { toJsonFriendly } from '../../shared/schemas/runs';

// A small hooded bench with a limit, so every optional part of the result is present.
const prepared = prepareTest({
  ...workstation,
  limit: { fraction: 'respirable', value_mgPerM3: 0.1 },
  run: { particles: 400, batches: 2, seed: 5 },
});
const fresh = combineBatches(prepared, runAll(prepared));
const viaJson = (value: unknown) => JSON.parse(JSON.stringify(toJsonFriendly(value)));

describe('runResultSchema', () => {
  it('accepts the current engine output as it is, typed arrays and all', () => {
    const parsed = runResultSchema.parse(fresh);
    expect(parsed).toEqual(fresh);
    expect(parsed.trajectories.positions_m).toBe(fresh.trajectories.positions_m);
    expect(parsed.engine.version).toBe(ENGINE_VERSION);
    expect(parsed.limit?.banner).toBe(fresh.limit?.banner);
  });

  it('reads the JSON of that output back to the same result, null turning back into NaN', () => {
    const back = parseRunResult(viaJson(fresh));
    // Frames before a particle's release are NaN (see results-shape.test.ts); JSON spells them null.
    const nan = fresh.trajectories.positions_m.filter(Number.isNaN).length;
    expect(nan).toBeGreaterThan(0);
    expect(back.trajectories.positions_m).toBeInstanceOf(Float32Array);
    expect(back.trajectories.bins).toBeInstanceOf(Int32Array);
    expect(back.maps.deposition_mgPerM2.values).toBeInstanceOf(Float32Array);
    expect(back.trajectories.positions_m.filter(Number.isNaN).length).toBe(nan);
    expect(back).toEqual(fresh);
    expect(viaJson(back)).toEqual(viaJson(fresh));
  });

  it("reads the CLI's --json output back to the same result", () => {
    expect(parseRunResult(JSON.parse(resultsToJson(fresh)))).toEqual(fresh);
  });

  it('reads a typed array that went through JSON.stringify untouched ({"0":…,"1":…})', () => {
    const raw = JSON.parse(JSON.stringify({ ...fresh, trajectories: { ...fresh.trajectories, bins: fresh.trajectories.bins } }));
    expect(raw.trajectories.bins).not.toBeInstanceOf(Array);
    expect(Array.from(parseRunResult(raw).trajectories.bins)).toEqual(Array.from(fresh.trajectories.bins));
  });
});

// Fixtures written by hand in the Results shapes of git history: f68997c (1.0.0, no sizeBins) and
// 479f57e onwards (sizeBins added, unchanged through 1.2.0), stored the way toJsonFriendly spells them.
describe('parseRunResult on stored results of older engines', () => {
  it('upgrades a 1.0.0 result written before sizeBins existed, keeping its version', () => {
    const r = parseRunResult(before);
    expect(r.engine.version).toBe('1.0.0');
    expect(r.sizeBins).toEqual({ aerodynamic_m: [], physical_m: [] });
    expect(r.limit).toEqual(before.limit);
    expect(r.crossChecks.eddySteady_mgPerM3).toBeNaN();
    expect(Array.from(r.trajectories.positions_m.slice(0, 4))).toEqual([NaN, NaN, NaN, Math.fround(2)]);
  });

  it('reads a later 1.0.0 result and a 1.2.0 one without changing their figures', () => {
    for (const stored of [v100, v120]) {
      const r = parseRunResult(stored);
      expect(r.engine.version).toBe(stored.engine.version);
      expect(r.sizeBins).toEqual(stored.sizeBins);
      expect(r.breathingZone.fractions).toEqual(stored.breathingZone.fractions);
      // Engines before 2.0 had no wall deposition: their walls share reads 0.
      expect(r.fate).toEqual({ ...stored.fate, walls: 0 });
      expect(Array.from(r.maps.captureVelocity_mPerS.values)).toEqual(stored.maps.captureVelocity_mPerS.values.map(Math.fround));
    }
    expect(parseRunResult(v100).limit).toBeUndefined();
  });
});

describe('parseRunResult on malformed results', () => {
  it('names the field and quotes the bad value', () => {
    expect(() => parseRunResult(null)).toThrow('result: Invalid input: expected object, received null, got null');
    expect(() =>
      parseRunResult({ ...v120, breathingZone: { ...v120.breathingZone, series: { ...v120.breathingZone.series, time_s: 'soon' } } }),
    ).toThrow('breathingZone.series.time_s must be a list of numbers, got "soon"');
    expect(() => parseRunResult({ ...v120, limit: { ...v120.limit, banner: 'green' } })).toThrow(/limit\.banner: .*"clear".*, got "green"/);
    expect(() => parseRunResult({ ...v120, trajectories: { ...v120.trajectories, positions_m: [1, 2, 3] } })).toThrow(
      'trajectories.positions_m must hold particles·frames·3 = 12 numbers, got 3',
    );
    expect(() =>
      parseRunResult({ ...v120, maps: { ...v120.maps, deposition_mgPerM2: { ...v120.maps.deposition_mgPerM2, values: [0, 'x', 1, 2] } } }),
    ).toThrow('maps.deposition_mgPerM2.values.1 must hold numbers, got "x"');
  });
});
