import { jetDiffusivityAndGradient } from '../../shared/physics/jet-diffusivity';
import { JET_SPREADING_RATE, jetVelocity } from '../../shared/physics/round-jet';
import { addHoodVelocity } from './hood-field';
import { type Kernel, SCALAR } from './kernel';

// The walk's field evaluations and frame recording (walk.ts), apart so the step loop reads as one page.
const JET_WIDTH_GROWTH = +JET_SPREADING_RATE;

/**
 * The air's drift velocity at a point (draft, hood sink panels, release jet and the jet's ∇D) into
 * k.air[0..2]; returns the jet's eddy diffusivity there. With withScales it also leaves the nearest
 * face's distance in k.air[3] and the jet's length scale in k.air[4] for the step rule.
 * One function for the start-of-step and the midpoint evaluations.
 */
export function airAt(k: Kernel, x: number, y: number, z: number, withScales: number): number {
  const field = k.field;
  const air = k.air;
  const sc = k.scalars;
  field[0] = sc[SCALAR.draftX];
  field[1] = sc[SCALAR.draftY];
  field[2] = 0;
  field[3] = Infinity;
  const nh = k.hoodCount;
  if (nh > 0) addHoodVelocity(k.hoods, nh, x, y, z, field);
  air[0] = field[0];
  air[1] = field[1];
  air[2] = field[2];
  if (withScales) {
    air[3] = field[3];
    air[4] = Infinity;
    // The hoods' own drift (beside the draft), which decides whether a particle is deep in a capture region.
    air[5] = Math.abs(field[0] - sc[SCALAR.draftX]) + Math.abs(field[1] - sc[SCALAR.draftY]) + Math.abs(field[2]);
  }
  if (sc[SCALAR.jet] <= 0) return 0;
  const jet = k.jet;
  jetVelocity(jet, x, y, z, field);
  air[0] += field[0];
  air[1] += field[1];
  air[2] += field[2];
  const jetD = jetSpread(jet, x, y, z, field);
  air[0] += field[1];
  air[1] += field[2];
  air[2] += field[3];
  if (withScales) air[4] = field[4];
  return jetD;
}

/**
 * The jet's eddy diffusivity (returned) and its gradient in out[1..3], which the walk adds to the
 * drift (without it particles would pile up where D is small); out[4] is the length over which the
 * jet changes at this point (its half-width there), for the step rule.
 */
function jetSpread(jet: Kernel['jet'], x: number, y: number, z: number, out: Float64Array): number {
  jetDiffusivityAndGradient(jet, x, y, z, out);
  const d = out[0];
  const ax = x - jet.ox_m;
  const ay = y - jet.oy_m;
  const az = z - jet.oz_m;
  const along = ax * jet.ex + ay * jet.ey + az * jet.ez;
  const nozzle = 0.5 * jet.diameter_m;
  if (along <= 0) {
    // Behind the nozzle the jet's nearest feature is the nozzle itself.
    out[4] = Math.sqrt(ax * ax + ay * ay + az * az) + nozzle;
    return d;
  }
  // The jet changes over its half-width inside it, and over the distance to its edge outside.
  const halfWidth = JET_WIDTH_GROWTH * along + nozzle;
  const rx = ax - along * jet.ex;
  const ry = ay - along * jet.ey;
  const rz = az - along * jet.ez;
  const outside = Math.sqrt(rx * rx + ry * ry + rz * rz) - halfWidth;
  out[4] = outside > halfWidth ? outside : halfWidth;
  return d;
}

export function recordFrames(k: Kernel, sl: number, t: number, x: number, y: number, z: number): void {
  const frames = k.frames;
  let f = k.nextFrame[sl];
  while (f < frames && f * k.frameInterval_s <= t) {
    const o = (sl * frames + f) * 3;
    k.trajectories[o] = x;
    k.trajectories[o + 1] = y;
    k.trajectories[o + 2] = z;
    f++;
  }
  k.nextFrame[sl] = f;
}
