import type { Scenario } from '../../shared/schemas/scenario';
import { type AirProperties, aerodynamicDiameter } from '../../shared/physics/index';
import { exp, log } from '../../shared/det-math/index';

/**
 * The simulated sizes run from 1 nm physical diameter to 100 µm aerodynamic diameter.
 *
 * The lower end is physical because below a few nanometres Brownian motion, which depends on the
 * physical size, is all that moves a particle, and 1 nm is where the slip correction's tabulated
 * range starts (Hinds App. A11); smaller clusters are vapour rather than dust. The upper end is
 * aerodynamic because ISO 7708 defines inhalability only up to 100 µm aerodynamic diameter.
 *
 * The grid is aerodynamic, 12 bins per decade (ratio 1.21) anchored at 100 µm: the ISO 7708
 * curves are written in aerodynamic diameter and the respirable curve's width ln 1.5 spans two
 * bins, and the 0.1–100 µm edges stay those of earlier engines, so results for dust in that range
 * do not move. Below 1 µm d_a/d_p grows from √(ρ/χρ₀) towards ρ/(χρ₀) as slip takes over, so in
 * physical diameter the same grid is 12 per decade at unit density and about 9 per decade for
 * steel (7800 kg/m³) in the transition range. The bottom bin ends at d_a(1 nm); if that leaves a
 * sliver narrower than half a bin, it joins the bin above.
 */
export const SIZE_MIN_PHYSICAL_m = 1e-9;
export const SIZE_MAX_AERODYNAMIC_m = 100e-6;
export const BINS_PER_DECADE = 12;

type Particle = Pick<Scenario['dust'], 'density_kgPerM3' | 'shapeFactor'>;

/** Aerodynamic bin edges, increasing; their count depends on the dust through d_a(1 nm). */
export function binEdges_m(dust: Particle, air: AirProperties): Float64Array {
  const lower_m = aerodynamicDiameter(SIZE_MIN_PHYSICAL_m, dust.density_kgPerM3, dust.shapeFactor, air);
  const step = Math.LN10 / BINS_PER_DECADE;
  const span = log(SIZE_MAX_AERODYNAMIC_m / lower_m) / step;
  const whole = Math.floor(span + 1e-9);
  const count = Math.max(1, span - whole >= 0.5 ? whole + 1 : whole);
  const edges = new Float64Array(count + 1);
  for (let i = 1; i <= count; i++) edges[i] = SIZE_MAX_AERODYNAMIC_m * exp((i - count) * step);
  edges[0] = lower_m;
  return edges;
}
