import type { Banner } from '../../../../shared/physics/index';
import type { Fraction } from '../../../../shared/vocabulary/fractions';
import type { RunResult } from '../../../../shared/schemas/run-result';

/** What the sweep keeps of one run: the limit fraction's 8-h TWA with its interval and the verdict. */
export interface PointResult {
  fraction: Fraction;
  twa8h_mgPerM3: number;
  twa8hCi95_mgPerM3: [number, number];
  percentOfLimit: number;
  percentOfLimitUpper: number;
  percentOfLimitLower: number;
  banner: Banner;
  particles: number;
}

// The rest of RunResult (series, maps, trajectories) is dropped: twelve full runs would hold tens of megabytes.
export function pointResult(results: RunResult): PointResult {
  const limit = results.limit;
  if (!limit) throw new Error('The run has no exposure limit, so the sweep cannot compare it with a target.');
  const s = results.breathingZone.fractions[limit.fraction];
  return {
    fraction: limit.fraction,
    twa8h_mgPerM3: s.twa8h_mgPerM3,
    twa8hCi95_mgPerM3: s.twa8hCi95_mgPerM3,
    percentOfLimit: limit.percentOfLimit,
    percentOfLimitUpper: limit.percentOfLimitUpper,
    percentOfLimitLower: (100 * s.twa8hCi95_mgPerM3[0]) / limit.value_mgPerM3,
    banner: limit.banner,
    particles: results.engine.particles,
  };
}
