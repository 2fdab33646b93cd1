import { jetDiffusivityAndGradientAt } from '../../shared/physics/jet-diffusivity';
import { JET_SPREADING_RATE, jetVelocityAt } from '../../shared/physics/round-jet';
import { addHoodVelocityAt } from './hood-field';
import { type Kernel, SCALAR } from './kernel';

// The walk's field evaluations and frame recording (walk.ts), apart so the step loop reads as one page.
const JET_WIDTH_GROWTH = +JET_SPREADING_RATE;

/**
 * The air's drift velocity at the point k.at[0..2] (draft, hood sink panels, release jet and the jet's ∇D) into
 * k.air[0..2], and the jet's eddy diffusivity there into k.air[6]. With withScales it also leaves the nearest
 * face's distance in k.air[3] and the jet's length scale in k.air[4] for the step rule.
 * One function for the start-of-step and the midpoint evaluations. The point comes, and the results go, in arrays:
 * a double crossing a call V8 has not inlined is a heap allocation, and in Chromium two workers allocating at every
 * step ran no faster together than one alone.
 */
export function airAt(k: Kernel, withScales: number): void {
  const field = k.field;
  const air = k.air;
  const sc = k.scalars;
  const at = k.at;
  field[0] = sc[SCALAR.draftX];
  field[1] = sc[SCALAR.draftY];
  field[2] = 0;
  field[3] = Infinity;
  const nh = k.hoodCount;
  if (nh > 0) addHoodVelocityAt(k.hoods, nh, at, field);
  air[0] = field[0];
  air[1] = field[1];
  air[2] = field[2];
  if (withScales) {
    air[3] = field[3];
    air[4] = Infinity;
    // The hoods' own drift (beside the draft), which decides whether a particle is deep in a capture region.
    air[5] = Math.abs(field[0] - sc[SCALAR.draftX]) + Math.abs(field[1] - sc[SCALAR.draftY]) + Math.abs(field[2]);
  }
  air[6] = 0;
  if (sc[SCALAR.jet] <= 0) return;
  const jet = k.jet;
  jetVelocityAt(jet, at, field);
  air[0] += field[0];
  air[1] += field[1];
  air[2] += field[2];
  jetSpread(jet, at, field);
  air[0] += field[1];
  air[1] += field[2];
  air[2] += field[3];
  if (withScales) air[4] = field[4];
  air[6] = field[0];
}

/**
 * The jet's eddy diffusivity in out[0] and its gradient in out[1..3], which the walk adds to the
 * drift (without it particles would pile up where D is small); out[4] is the length over which the
 * jet changes at this point (its half-width there), for the step rule.
 */
function jetSpread(jet: Kernel['jet'], at: Float64Array, out: Float64Array): void {
  jetDiffusivityAndGradientAt(jet, at, out);
  const ax = at[0] - jet.ox_m;
  const ay = at[1] - jet.oy_m;
  const az = at[2] - jet.oz_m;
  const along = ax * jet.ex + ay * jet.ey + az * jet.ez;
  const nozzle = 0.5 * jet.diameter_m;
  if (along <= 0) {
    // Behind the nozzle the jet's nearest feature is the nozzle itself.
    out[4] = Math.sqrt(ax * ax + ay * ay + az * az) + nozzle;
    return;
  }
  // The jet changes over its half-width inside it, and over the distance to its edge outside.
  const halfWidth = JET_WIDTH_GROWTH * along + nozzle;
  const rx = ax - along * jet.ex;
  const ry = ay - along * jet.ey;
  const rz = az - along * jet.ez;
  const outside = Math.sqrt(rx * rx + ry * ry + rz * rz) - halfWidth;
  out[4] = outside > halfWidth ? outside : halfWidth;
}

/** Frames of sampled particle sl up to the time and position in k.seg[0..3] (t, x, y, z): an array, not arguments. */
export function recordFrames(k: Kernel, sl: number): void {
  const frames = k.frames;
  const seg = k.seg;
  const t = seg[0];
  let f = k.nextFrame[sl];
  while (f < frames && f * k.frameInterval_s <= t) {
    const o = (sl * frames + f) * 3;
    k.trajectories[o] = seg[1];
    k.trajectories[o + 1] = seg[2];
    k.trajectories[o + 2] = seg[3];
    f++;
  }
  k.nextFrame[sl] = f;
}
