import { exp, log } from '../det-math/index';
import { normalCdf } from './normal';
import { requireNonNegative } from './validate';

export type SamplingConvention = 'inhalable' | 'thoracic' | 'respirable';

const METRES_TO_MICROMETRES = 1e6;
const INHALABLE_LIMIT_um = 100;
const LN_GSD = log(1.5);

// ISO 7708 defines inhalability only to 100 µm; beyond it we count nothing rather than extrapolate.
export function inhalableFraction(d_m: number): number {
  const d_um = requireNonNegative('d_m', d_m) * METRES_TO_MICROMETRES;
  if (d_um > INHALABLE_LIMIT_um) return 0;
  return 0.5 * (1 + exp(-0.06 * d_um));
}

// ISO 7708 thoracic convention: E_I·[1 − Φ(ln(d/11.64)/ln 1.5)] (Soderholm 1989).
export function thoracicFraction(d_m: number): number {
  return penetrating(d_m, 11.64);
}

// ISO 7708 respirable convention: E_I·[1 − Φ(ln(d/4.25)/ln 1.5)] (Soderholm 1989).
export function respirableFraction(d_m: number): number {
  return penetrating(d_m, 4.25);
}

// Φ(−z) rather than 1 − Φ(z) keeps precision in the coarse tail, where the fraction is tiny.
function penetrating(d_m: number, median_um: number): number {
  const inhalable = inhalableFraction(d_m);
  if (d_m === 0) return inhalable;
  return inhalable * normalCdf(-log((d_m * METRES_TO_MICROMETRES) / median_um) / LN_GSD);
}

export function conventionFraction(convention: SamplingConvention): (d_m: number) => number {
  switch (convention) {
    case 'inhalable':
      return inhalableFraction;
    case 'thoracic':
      return thoracicFraction;
    case 'respirable':
      return respirableFraction;
    default:
      throw new RangeError(`convention must be 'inhalable', 'thoracic' or 'respirable', got ${String(convention)}`);
  }
}
