import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario } from '../../shared/schemas/scenario';
import { runAll } from './engine.test-helper';
import { HOOD_STRIDE, packHoods } from './hood-field';
import { HOOD_KIND } from './hood-slots';
import { prepareScenario } from './prepare';
import { FATES, type BatchResult } from './types';

type Direction = Scenario['hoods'][number]['direction'];

// The joinery demo's sander over its bench (shared/demo-scenarios/joinery-sander-downdraft-bench.json), cut to a
// short, small run: the comparison needs the same seed, not precision.
function joinery(kind: 'downdraft-bench' | 'flanged', direction: Direction = { x: 0, y: 0, z: 1 }) {
  return parseScenario({
    room: { length_m: 10, width_m: 7, height_m: 3.5, airChanges_perH: 1.5, draftSpeed_mPerS: 0.05, draftDirection_deg: 180 },
    source: {
      x_m: 4,
      y_m: 3,
      z_m: 0.9,
      shape: 'disc',
      size_m: 0.15,
      emission: { kind: 'continuous', rate_mgPerMin: 60, taskDuration_min: 60 },
      releaseType: 'active',
      jet: { speed_mPerS: 4, direction: { azimuth_deg: 270, elevation_deg: 0 }, diameter_m: 0.03 },
    },
    dust: { density_kgPerM3: 1400, shapeFactor: 1.4, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 1.5e-5, gsd: 2.5 } },
    worker: { x_m: 4, y_m: 2.7, z_m: 1.3 },
    limit: { fraction: 'inhalable', value_mgPerM3: 2 },
    hoods: [{ kind, x_m: 4, y_m: 3, z_m: 0.85, direction, faceWidth_m: 1, faceHeight_m: 0.6, airflow_m3PerS: 0.6 }],
    run: { particles: 600, batches: 2, seed: 20240601, duration_s: 300 },
  });
}

// Everything a batch reports except how long it took on this machine, typed arrays as their raw bytes.
function comparable(batches: BatchResult[]) {
  return batches.map(({ wallTime_s: _time, ...rest }) =>
    Object.fromEntries(
      Object.entries(rest).map(([key, value]) => [
        key,
        ArrayBuffer.isView(value) ? new Uint8Array(value.buffer, value.byteOffset, value.byteLength) : value,
      ]),
    ),
  );
}

let benchRun: BatchResult[] | undefined;
const bench = () => (benchRun ??= runAll(prepareScenario(joinery('downdraft-bench'))));

describe('a downdraft bench in the engine', () => {
  it('packs as a flanged face facing up in every slot but its kind code', () => {
    const bench = packHoods(joinery('downdraft-bench').hoods);
    const flanged = packHoods(joinery('flanged').hoods);
    for (let slot = 0; slot < HOOD_STRIDE; slot++) {
      if (slot !== HOOD_KIND) expect(Object.is(bench[slot], flanged[slot]), `slot ${slot}`).toBe(true);
    }
  });

  it('gives bit-identical batches to the same flanged opening facing up, same seed', () => {
    const flanged = runAll(prepareScenario(joinery('flanged')));
    expect(comparable(bench())).toEqual(comparable(flanged));
    // The comparison is not between two empty runs: the bench takes a real share of the dust.
    const captured = bench().reduce((a, b) => a + b.fateMass_mg[FATES.indexOf('captured')], 0);
    const emitted = bench().reduce((a, b) => a + b.fateMass_mg.reduce((x, y) => x + y, 0), 0);
    expect(captured / emitted).toBeGreaterThan(0.05);
  });

  it('differs from a flanged opening facing sideways, so the comparison can tell faces apart', () => {
    const sideways = runAll(prepareScenario(joinery('flanged', { azimuth_deg: 90, elevation_deg: 0 })));
    expect(comparable(bench())).not.toEqual(comparable(sideways));
  });
});
