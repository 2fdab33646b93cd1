import { resolveJet } from '../../shared/physics/release-jets';
import type { RoundJet } from '../../shared/physics/round-jet';
import type { Scenario } from '../../shared/schemas/scenario';

/**
 * The scenario's release jet in the engine's form. The nozzle sits half a diameter behind the
 * source, so dust released at the source starts inside the jet's potential core, where the
 * induced air carries it (a thrown particle's own stop distance V·τ is millimetres: Hinds ch. 5).
 */
export function releaseJet(s: Scenario): RoundJet | undefined {
  const jet = resolveJet(s.source, s.worker);
  if (!jet) return undefined;
  const [ex, ey, ez] = jet.direction;
  const back_m = 0.5 * jet.diameter_m;
  return {
    ox_m: s.source.x_m - back_m * ex,
    oy_m: s.source.y_m - back_m * ey,
    oz_m: s.source.z_m - back_m * ez,
    ex,
    ey,
    ez,
    speed_mPerS: jet.speed_mPerS,
    diameter_m: jet.diameter_m,
  };
}
