import type { DepositionVelocities } from './surface-deposition';
import { requireNonNegative, requirePositive } from './validate';

export interface RoomSurfaces {
  vertical_m2: number;
  upward_m2: number;
  downward_m2: number;
  volume_m3: number;
}

// Well-mixed loss to surfaces β = (v_dv·A_v + v_du·A_u + v_dd·A_d)/V (Lai & Nazaroff 2000).
export function roomDepositionRate(room: RoomSurfaces, velocities: DepositionVelocities): number {
  const vertical = requireNonNegative('vertical_m2', room.vertical_m2) * velocities.vertical_mPerS;
  const upward = requireNonNegative('upward_m2', room.upward_m2) * velocities.upward_mPerS;
  const downward = requireNonNegative('downward_m2', room.downward_m2) * velocities.downward_mPerS;
  return (vertical + upward + downward) / requirePositive('volume_m3', room.volume_m3);
}

// A random walk whose steps reflect at a surface that absorbs a flux v_d·C takes each hit as
// absorbed with P = v_d·√(πΔt/D) (Erban & Chapman, Phys. Biol. 4:16, 2007; Singer et al.,
// SIAM J. Appl. Math. 68:844, 2008). Valid while P ≪ 1; it is capped at 1, where the surface
// is as absorbing as a walk with this step can resolve, and `capped` says so.
export function absorptionProbability(
  depositionVelocity_mPerS: number,
  diffusivity_m2PerS: number,
  timeStep_s: number,
): { probability: number; capped: boolean } {
  const v = requireNonNegative('depositionVelocity_mPerS', depositionVelocity_mPerS);
  const d = requirePositive('diffusivity_m2PerS', diffusivity_m2PerS);
  const dt = requirePositive('timeStep_s', timeStep_s);
  const probability = v * Math.sqrt((Math.PI * dt) / d);
  return probability > 1 ? { probability: 1, capped: true } : { probability, capped: false };
}
