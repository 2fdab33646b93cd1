import { FACE_RESOLUTION_m } from './hood-field';
import type { PreparedScenario } from './types';

/**
 * Adaptive step rule. With f the run's stepFraction and d the distance to the nearest feature
 * (breathing-zone sphere surface, floored at its radius R; hood face outline, floored at
 * FACE_RESOLUTION_m; a release jet's half-width), a step obeys 3·√(2·D·dt) ≤ f·d, |u|₁·dt ≤ f·d_zone,
 * |u|₁·dt ≤ (f/10)·d_hood (the hood field changes over its own distance, so drift there needs finer
 * steps), |u|₁·dt ≤ f·r½ in a jet, and dt ≤ maxTimeStep_s. Far from features the step is large, which
 * is exact for the uniform draft, settling and diffusion there; walls, floor and faces need no limit
 * because reflection and absorption there are applied to each step's own displacement. Near hoods
 * and in a jet the drift uses the velocity at the step's midpoint.
 */
export interface StepRule {
  driftFraction: number;
  zoneFloor_m: number;
  hoodFloor_m: number;
  maxStep_s: number;
  minStep_s: number;
}

export const DRIFT_SHARE = 0.1;
export const MIN_STEP_s = 1e-4;

export function stepRule(p: PreparedScenario): StepRule {
  return {
    driftFraction: DRIFT_SHARE * p.stepFraction,
    zoneFloor_m: p.zone.radius_m,
    hoodFloor_m: FACE_RESOLUTION_m,
    maxStep_s: p.maxTimeStep_s,
    minStep_s: Math.min(MIN_STEP_s, p.maxTimeStep_s),
  };
}
