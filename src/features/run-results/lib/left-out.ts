import { percentText, trimSig } from '../../../../shared/format/index';
import type { MassLeftOut } from '../../../../shared/schemas/run-result';
import { metresToMicrometres, metresToNanometres } from '../../../../shared/units';

// Below a tenth of a percent the left-out mass is smaller than the run's own statistical error on
// any fate, so the sentence would only distract (common practice for "negligible").
export const NEGLIGIBLE_SHARE = 0.001;

const pct = (share: number) => percentText(100 * share, 2);

/** How much of the emission lies outside the simulated sizes, or null when that is negligible or unknown (older engines). */
export function leftOutSentence(m: MassLeftOut | undefined): string | null {
  if (!m || !(m.share >= NEGLIGIBLE_SHARE)) return null;
  const below = `below ${trimSig(metresToNanometres(m.lowerPhysical_m), 3)} nm`;
  const above = `above ${trimSig(metresToMicrometres(m.upperAerodynamic_m), 3)} µm aerodynamic diameter`;
  const rest = 'the concentrations and fates shown cover the rest.';
  const half = NEGLIGIBLE_SHARE / 2;
  if (m.below >= half && m.above >= half)
    return `${pct(m.below)} of the emitted mass is ${below} and ${pct(m.above)} ${above}; neither is simulated, and ${rest}`;
  const [share, where] = m.below >= half ? [m.below, below] : [m.above, above];
  return `${pct(share)} of the emitted mass is ${where} and is not simulated; ${rest}`;
}
