import { describe, expect, it } from 'vitest';
import { depositionVelocities } from '../../shared/physics/index';
import { meanAndError, prepareTest, runAll } from './engine.test-helper';

const box = { length_m: 2, width_m: 2, height_m: 2, airChanges_perH: 0, eddyDiffusivity_m2PerS: 0.3 };
const release = { x_m: 1, y_m: 1, z_m: 1, emission: { kind: 'bursts', massPerEvent_mg: 1, eventsPerHour: 1, taskDuration_min: 1 } };
const dust = { density_kgPerM3: 1000, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 1e-6, gsd: 1 } };

function shares(p: ReturnType<typeof prepareTest>, fate: number): { mean: number; se: number } {
  return meanAndError(runAll(p).map((b) => b.fateMass_mg[fate] / b.fateMass_mg.reduce((a, v) => a + v, 0)));
}

describe('surfaces that collect (room.wallDeposition)', () => {
  // Deposition velocities set by hand so the check is on the walk's absorbing boundary, not on the
  // Lai & Nazaroff velocities (tested in shared/physics/surface-deposition.test.ts).
  const walls = 4e-4;
  const ceiling = 2e-4;
  const floor = 3e-4;
  const duration = 1800;

  it('a well-mixed room loses dust to its surfaces at Σ v_d·A/V (Lai & Nazaroff 2000, box model)', () => {
    const p = prepareTest(
      {
        room: { ...box, wallDeposition: true },
        source: release,
        dust,
        worker: { x_m: 0.3, y_m: 0.3, z_m: 1 },
        run: { particles: 800, batches: 8, seed: 11, duration_s: duration },
      },
      (q) => {
        q.bins.settling_mPerS.fill(0);
        q.surfaces.wall_mPerS.fill(walls);
        q.surfaces.ceiling_mPerS.fill(ceiling);
        q.surfaces.floorExtra_mPerS.fill(floor);
      },
    );
    const volume = 8;
    const wallRate = (walls * 16 + ceiling * 4) / volume;
    const floorRate = (floor * 4) / volume;
    const total = wallRate + floorRate;
    const lost = 1 - Math.exp(-total * duration);
    const onWalls = shares(p, 4);
    const onFloor = shares(p, 1);
    // 3.5 standard errors of the batch mean plus 1 % for the O(√dt) boundary error (common practice).
    expect(Math.abs(onWalls.mean - (lost * wallRate) / total), `walls ${onWalls.mean}`).toBeLessThan(3.5 * onWalls.se + 0.01);
    expect(Math.abs(onFloor.mean - (lost * floorRate) / total), `floor ${onFloor.mean}`).toBeLessThan(3.5 * onFloor.se + 0.01);
  }, 120_000);

  it('walls a draft wraps through collect as a loss per volume, v_d·A/V', () => {
    const p = prepareTest(
      {
        room: { ...box, wallDeposition: true, draftSpeed_mPerS: 0.2 },
        source: release,
        dust,
        worker: { x_m: 0.3, y_m: 0.3, z_m: 1 },
        run: { particles: 800, batches: 8, seed: 12, duration_s: duration },
      },
      (q) => {
        q.bins.settling_mPerS.fill(0);
        q.surfaces.wall_mPerS.fill(walls);
        q.surfaces.ceiling_mPerS.fill(0);
        q.surfaces.floorExtra_mPerS.fill(0);
      },
    );
    // prepare gave the wrapped pair (normal to the draft) its loss rate from the real velocity; set ours.
    p.surfaces.wrappedWallRate_perS.fill((walls * 8) / 8);
    const rate = (walls * 16) / 8;
    const onWalls = shares(p, 4);
    const expected = 1 - Math.exp(-rate * duration);
    expect(Math.abs(onWalls.mean - expected), `walls ${onWalls.mean} vs ${expected}`).toBeLessThan(3.5 * onWalls.se + 0.01);
  }, 120_000);

  it('with room.wallDeposition false walls and ceiling reflect as before and nothing deposits on them', () => {
    const p = prepareTest({
      room: { ...box, wallDeposition: false },
      source: release,
      dust,
      worker: { x_m: 0.3, y_m: 0.3, z_m: 1 },
      run: { particles: 200, batches: 2, seed: 3, duration_s: 600 },
    });
    expect(runAll(p).reduce((a, b) => a + b.fateMass_mg[4], 0)).toBe(0);
  }, 60_000);

  it('takes its deposition velocities from the Lai & Nazaroff model for each size bin', () => {
    const p = prepareTest({ room: { ...box, wallDeposition: true }, source: release, dust, worker: { x_m: 0.3, y_m: 0.3, z_m: 1 } });
    const b = p.bins.massFraction.findIndex((m) => m > 0.999);
    const v = depositionVelocities(p.bins.physical_m[b], 1000, p.surfaces.frictionVelocity_mPerS);
    expect(p.surfaces.wall_mPerS[b]).toBe(v.vertical_mPerS);
    expect(p.surfaces.ceiling_mPerS[b]).toBe(v.downward_mPerS);
    expect(p.surfaces.floorExtra_mPerS[b]).toBeCloseTo(v.upward_mPerS - v.settling_mPerS, 15);
  });
});
