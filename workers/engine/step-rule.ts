import { CAPTURE_DEPTH_m } from './hood-field';
import type { PreparedScenario } from './types';

/**
 * Adaptive step rule. With f the run's stepFraction and d the distance to the nearest feature
 * (breathing-zone sphere surface, floored at its radius R; hood face outline, floored at half the capture
 * depth), a step obeys 3·√(2·D·dt) ≤ f·d and |u|₁·dt ≤ f·d_zone, |u|₁·dt ≤ (f/10)·d_hood (the hood
 * field changes over its own distance, so drift there needs finer steps), and dt ≤ maxTimeStep_s. Far from
 * features the step is large, which is exact for the uniform draft, settling and diffusion there;
 * the floor and walls need no limit because reflection and settling outflow are exact for any dt.
 * Near hoods the drift uses the midpoint velocity (for a single plain or flanged opening its
 * first-order Taylor expansion v + (dt/2)·J·u from the field's analytic derivative, which is second
 * order in dt like the full re-evaluation that slots and several hoods take) and face contact between steps is sampled with
 * the Brownian-bridge crossing probability.
 */
export interface StepRule {
  diffusionFactor: Float64Array;
  driftFraction: number;
  zoneFloor_m: number;
  hoodFloor_m: number;
  maxStep_s: number;
  minStep_s: number;
}

export const DRIFT_SHARE = 0.1;
export const MIN_STEP_s = 1e-4;

export function stepRule(p: PreparedScenario): StepRule {
  const f = p.stepFraction;
  const diffusionFactor = p.bins.diffusivity_m2PerS.map((d) => (d > 0 ? (f * f) / (18 * d) : Infinity));
  return {
    diffusionFactor,
    driftFraction: DRIFT_SHARE * f,
    zoneFloor_m: p.zone.radius_m,
    hoodFloor_m: 0.5 * CAPTURE_DEPTH_m,
    maxStep_s: p.maxTimeStep_s,
    minStep_s: Math.min(MIN_STEP_s, p.maxTimeStep_s),
  };
}
