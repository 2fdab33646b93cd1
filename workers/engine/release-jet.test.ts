import { describe, expect, it } from 'vitest';
import { jetCentrelineSpeed } from '../../shared/physics/round-jet';
import { meanAndError, prepareTest, runAll } from './engine.test-helper';

const hood = {
  kind: 'flanged',
  x_m: 2.3,
  y_m: 2,
  z_m: 1,
  direction: { x: -1, y: 0, z: 0 },
  faceWidth_m: 0.3,
  faceHeight_m: 0.3,
  airflow_m3PerS: 0.25,
};

function capturedShare(speed_mPerS: number, seed: number) {
  const p = prepareTest({
    room: { length_m: 4, width_m: 4, height_m: 3, airChanges_perH: 6, eddyDiffusivity_m2PerS: 0.005 },
    source: {
      x_m: 2,
      y_m: 2,
      z_m: 1,
      emission: { kind: 'continuous', rate_mgPerMin: 1, taskDuration_min: 1 },
      ...(speed_mPerS > 0 ? { jet: { speed_mPerS, diameter_m: 0.05, direction: { x: 0, y: 1, z: 0 } } } : {}),
    },
    dust: { density_kgPerM3: 1000, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 2e-6, gsd: 1 } },
    worker: { x_m: 1, y_m: 1, z_m: 1.5 },
    hoods: [hood],
    run: { particles: 1200, batches: 8, seed, duration_s: 60 },
  });
  return meanAndError(runAll(p).map((b) => b.fateMass_mg[0] / b.fateMass_mg.reduce((a, v) => a + v, 0)));
}

describe('release jet', () => {
  it('a jet aimed across a hood axis lowers capture as its speed rises (vector addition of jet and sink flows)', () => {
    const [still, slow, fast] = [0, 2, 6].map((speed, k) => capturedShare(speed, 20 + k));
    expect(still.mean - slow.mean, `${still.mean} → ${slow.mean}`).toBeGreaterThan(2 * Math.hypot(still.se, slow.se));
    expect(slow.mean - fast.mean, `${slow.mean} → ${fast.mean}`).toBeGreaterThan(2 * Math.hypot(slow.se, fast.se));
  }, 120_000);

  it('puts the nozzle half a diameter behind the source, so released dust starts in the potential core (Pope ch. 5)', () => {
    const p = prepareTest({
      source: { x_m: 50, y_m: 50, z_m: 50, jet: { speed_mPerS: 4, diameter_m: 0.1, direction: { x: 0, y: 0, z: 1 } } },
    });
    expect(p.jet).toMatchObject({ ox_m: 50, oy_m: 50, oz_m: 49.95, ez: 1, speed_mPerS: 4 });
    expect(jetCentrelineSpeed(0.05, 4, 0.1)).toBe(4);
    expect(p.model.jet).toMatchObject({ speed_mPerS: 4, fromDefault: false });
  });

  it('a quiet release has no jet', () => {
    const p = prepareTest({ source: { x_m: 50, y_m: 50, z_m: 50, releaseType: 'quiet' } });
    expect(p.jet).toBeUndefined();
    expect(p.model.jet).toBeNull();
  });
});
