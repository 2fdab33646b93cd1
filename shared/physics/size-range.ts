import { log } from '../det-math/index';
import { normalCdf } from './normal';
import { requireAtLeast, requirePositive } from './validate';

export interface MassLeftOut {
  below: number;
  above: number;
}

// Mass fractions of a lognormal profile outside [lower, upper]: Φ(ln(lower/MMD)/ln σg) below and
// Φ(−ln(upper/MMD)/ln σg) above (Hinds ch. 4). Diameters on the same axis as the median.
export function massOutsideRange(massMedian_m: number, gsd: number, lower_m: number, upper_m: number): MassLeftOut {
  requirePositive('massMedian_m', massMedian_m);
  requireAtLeast('gsd', gsd, 1);
  requirePositive('lower_m', lower_m);
  requirePositive('upper_m', upper_m);
  if (upper_m <= lower_m) throw new RangeError(`upper_m must exceed lower_m, got [${lower_m}, ${upper_m}]`);
  if (gsd === 1) {
    return { below: massMedian_m < lower_m ? 1 : 0, above: massMedian_m > upper_m ? 1 : 0 };
  }
  const lnGsd = log(gsd);
  return {
    below: normalCdf(log(lower_m / massMedian_m) / lnGsd),
    above: normalCdf(-log(upper_m / massMedian_m) / lnGsd),
  };
}
