import { exp, log, pow } from '../det-math/index';
import { requireAtLeast, requireNonNegative } from '../physics/validate';

/**
 * Day-to-day geometric standard deviation of a worker's 8-h exposures when nothing better is known.
 * Buringh & Lanting (Am. Ind. Hyg. Assoc. J. 52:6–13, 1991; journal details from memory) found from
 * 420 workplace data sets that few samples underestimate it and proposed a preliminary GSD of 2.7;
 * the often quoted 2.5 (common practice) would let a slightly higher mean pass.
 */
export const DEFAULT_DAY_TO_DAY_GSD = 2.7;
export const DAY_TO_DAY_GSD_SOURCE = 'Buringh & Lanting, AIHA J. 1991: preliminary day-to-day GSD from 420 workplace data sets';

// z of the one-sided 95th percentile of the standard normal.
const Z95 = 1.645;

/**
 * 95th percentile of lognormal daily exposures whose arithmetic mean is the given one:
 * AM = GM·e^(½ln²GSD) and X95 = GM·GSD^1.645 (AIHA Strategy, 4th ed.; lognormal identities).
 */
export function dailyP95(mean_mgPerM3: number, gsd: number): number {
  requireNonNegative('mean_mgPerM3', mean_mgPerM3);
  requireAtLeast('gsd', gsd, 1);
  const lnG = log(gsd);
  return (mean_mgPerM3 * pow(gsd, Z95)) / exp(0.5 * lnG * lnG);
}
