import { describe, expect, it } from 'vitest';
import { toJsonFriendly } from '../../../../shared/schemas/runs';
import { runEngine } from '../../../../tests/helpers/run-engine';
import { scenarioInput } from '../../../../tests/fixtures/workspace';
import { parseScenario } from '../../../../shared/schemas/scenario';
import { combineBatches, prepareScenario, runBatch } from '../../../../workers/engine/index';
import { normaliseResult } from './normalise-result';

function engineResult() {
  const prepared = prepareScenario(parseScenario(scenarioInput()));
  return combineBatches(prepared, Array.from({ length: prepared.batches }, (_, k) => runBatch(prepared, k)));
}

const fresh = engineResult();

describe('normaliseResult', () => {
  it('reads a fresh engine result with its typed arrays', () => {
    const view = normaliseResult(fresh);
    expect(view.engine).toMatchObject({ version: fresh.engine.version, seed: 7, particles: fresh.engine.particles, batches: 4, sizeBins: 36 });
    expect(view.fractions.respirable.twa8h_mgPerM3).toBe(fresh.breathingZone.fractions.respirable.twa8h_mgPerM3);
    expect(view.trajectories.positions_m).toBe(fresh.trajectories.positions_m);
    expect(view.maps.deposition_mgPerM2?.values).toHaveLength(40 * 40);
    expect(view.limit?.banner).toBe(fresh.limit?.banner);
  });

  it('gives the same view for the server JSON, with null read back as NaN', () => {
    const fromServer = JSON.parse(JSON.stringify(toJsonFriendly(fresh)));
    const a = normaliseResult(fresh);
    const b = normaliseResult(fromServer);
    expect(b.fractions).toEqual(a.fractions);
    expect(b.series).toEqual(a.series);
    expect(b.fate).toEqual(a.fate);
    expect(b.crossChecks).toEqual(a.crossChecks);
    expect(b.maps.captureVelocity_mPerS?.values).toEqual(a.maps.captureVelocity_mPerS?.values);
    expect(Array.from(b.trajectories.bins)).toEqual(Array.from(a.trajectories.bins));
    // Unsampled frames are NaN in the engine and null in JSON; both must come back as NaN.
    const nanA = a.trajectories.positions_m.filter(Number.isNaN).length;
    expect(nanA).toBeGreaterThan(0);
    expect(b.trajectories.positions_m.filter(Number.isNaN).length).toBe(nanA);
  });

  it('reads typed arrays that JSON.stringify turned into index-keyed objects', () => {
    const raw = JSON.parse(JSON.stringify(fresh));
    expect(Array.isArray(raw.trajectories.bins)).toBe(false);
    const view = normaliseResult(raw);
    expect(Array.from(view.trajectories.bins)).toEqual(Array.from(fresh.trajectories.bins));
    expect(view.maps.deposition_mgPerM2?.values[5]).toBeCloseTo(fresh.maps.deposition_mgPerM2.values[5], 6);
  });

  it('takes bin diameters from the result when a producer adds them', () => {
    const view = normaliseResult({ ...fresh, sizeBins: { aerodynamic_m: [1e-6, 2e-6] } });
    expect(view.trajectories.binDiameters_m).toEqual([1e-6, 2e-6]);
    const { sizeBins: _bins, ...older } = fresh as typeof fresh & { sizeBins?: unknown };
    expect(normaliseResult(older).trajectories.binDiameters_m).toBeUndefined();
  });

  it('leaves the limit out when the scenario has none', () => {
    const { result } = runEngine(scenarioInput({ limit: undefined }));
    expect(normaliseResult(result).limit).toBeUndefined();
  });

  it('names the field and the bad value when the result is malformed', () => {
    expect(() => normaliseResult(null)).toThrow('result must be an object, got null');
    expect(() => normaliseResult({ ...fresh, breathingZone: { ...fresh.breathingZone, series: { ...fresh.breathingZone.series, time_s: 'soon' } } })).toThrow(
      'breathingZone.series.time_s must be a list of numbers, got "soon"',
    );
    expect(() => normaliseResult({ ...fresh, limit: { ...fresh.limit, banner: 'green' } })).toThrow('limit.banner must be clear, watch or act, got "green"');
    const short = { ...fresh, trajectories: { ...fresh.trajectories, positions_m: [1, 2, 3] } };
    expect(() => normaliseResult(short)).toThrow(/positions_m must hold particles·frames·3 = \d+ numbers, got 3/);
  });
});
