import { type AirProperties, depositionVelocities } from '../../shared/physics/index';
import type { Scenario } from '../../shared/schemas/scenario';
import type { PreparedScenario, SizeBins } from './types';
import { hypot3 } from '../../shared/det-math/index';

// Indoor friction velocity: about 1 cm/s in still rooms (Lai & Nazaroff 2000's indoor range, from
// memory), and a twentieth of a draft that sweeps the surfaces [P] common practice.
const STILL_ROOM_FRICTION_mPerS = 0.01;
const FRICTION_PER_DRAFT = 0.05;

/** Per-bin deposition velocities on walls, floor (beyond settling) and ceiling, and the loss to walls a draft wraps through. */
export function surfaceDeposition(
  s: Scenario,
  bins: SizeBins,
  air: AirProperties,
  draft_mPerS: [number, number],
): PreparedScenario['surfaces'] {
  const n = bins.count;
  const draft = hypot3(draft_mPerS[0], draft_mPerS[1]);
  const frictionVelocity_mPerS = Math.max(STILL_ROOM_FRICTION_mPerS, FRICTION_PER_DRAFT * draft);
  const out: PreparedScenario['surfaces'] = {
    enabled: s.room.wallDeposition,
    wall_mPerS: new Float64Array(n),
    floorExtra_mPerS: new Float64Array(n),
    ceiling_mPerS: new Float64Array(n),
    wrappedWallRate_perS: new Float64Array(n),
    frictionVelocity_mPerS,
  };
  if (!s.room.wallDeposition) return out;
  const { length_m: L, width_m: W, height_m: H } = s.room;
  // A wrapped pair of walls is crossed, not hit: its collection becomes a loss v_d·A/V.
  const wrappedArea_m2 = (Math.abs(draft_mPerS[0]) > 1e-9 ? 2 * W * H : 0) + (Math.abs(draft_mPerS[1]) > 1e-9 ? 2 * L * H : 0);
  for (let b = 0; b < n; b++) {
    const v = depositionVelocities(bins.physical_m[b], s.dust.density_kgPerM3, frictionVelocity_mPerS, air);
    out.wall_mPerS[b] = v.vertical_mPerS;
    out.floorExtra_mPerS[b] = Math.max(0, v.upward_mPerS - v.settling_mPerS);
    out.ceiling_mPerS[b] = v.downward_mPerS;
    out.wrappedWallRate_perS[b] = (v.vertical_mPerS * wrappedArea_m2) / (L * W * H);
  }
  return out;
}
