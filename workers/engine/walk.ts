import { faceEnteredAt, reflectAtFacesAt } from './hood-field';
import { airAt, recordFrames } from './walk-air';
import { type Kernel, NORMAL_BLOCK, SCALAR } from './kernel';
import { fillNormals } from './ziggurat';
import * as det from '../../shared/det-math/index';
import { REWEIGHT, WINDOW } from './importance';

// Local copies of the deterministic functions this hot path calls (a module runner may read imports through getters),
// in their array forms: a double crossing a call V8 has not inlined is a heap allocation (det-math/words.ts IO).
const expIO = det.expIO;
const expm1IO = det.expm1IO;
const IO = det.IO;

// Long enough that a visit's set-up is small beside its steps, short enough that a pass over the
// live particles still reports progress within a batch.
const STEPS_PER_VISIT = 256;
// Young dust's room diffusivity D·(1 − e^(−age/T_L)) is integrated exactly while it still grows.
const YOUNG_AGE_TIMES = 10;
const FATE_CAPTURED = 0;
const FATE_SETTLED = 1;
const FATE_EXHAUSTED = 2;
const FATE_AIRBORNE = 3;
const FATE_WALLS = 4;

/**
 * Advances particle i by up to STEPS_PER_VISIT steps; returns its fate (FATES order), −1 while it
 * lives, or REWEIGHT when variance reduction must split it or play roulette before its next step
 * (its weight is then outside the window around k.pendingTarget). Allocation-free: the calls it makes at every step
 * take their numbers in arrays (k.at, k.seg, det.IO), never as arguments or results.
 *
 * One step (Itô, operator splitting): the drift (draft, hood sink panels, release jet, the jet's
 * ∇D and settling) moves the particle and is the only thing that can carry it through a hood face
 * or onto the floor; then the random part √(2D·dt)·ξ moves it and is reflected at faces, walls,
 * ceiling and floor, where surfaces that collect (room.wallDeposition) absorb a hit with
 * P = v_d·√(π·dt/D) (Erban & Chapman 2007). D is Brownian plus the room's eddy diffusivity, which
 * grows with the dust's age over the Lagrangian time T_L, plus the jet's own.
 */
export function walk(k: Kernel, i: number): number {
  const a = k.a;
  let x = a.x[i];
  let y = a.y[i];
  let z = a.z[i];
  let t = a.t[i];
  const b = a.bin[i];
  const born = a.release[i];
  // Settings come from Float64Arrays (see SCALAR): always doubles, so the compiled loop suits every scenario.
  const sc = k.scalars;
  const duration = sc[SCALAR.duration];
  const exhaustAt = a.exhaustAt[i];
  const wallAt = a.wallAt[i];
  const lossAt = exhaustAt < wallAt ? exhaustAt : wallAt;
  const end = lossAt < duration ? lossAt : duration;
  const vs = k.settling[b];
  const tau = k.relaxation[b];
  let ux = a.ux[i];
  let uy = a.uy[i];
  let uz = a.uz[i];
  const brownian = k.brownian[b];
  const roomD = sc[SCALAR.roomDiffusivity];
  const lagrangian = sc[SCALAR.lagrangianTime];
  const youngUntil = born + YOUNG_AGE_TIMES * lagrangian;
  const collects = sc[SCALAR.wallDeposition] > 0 ? 1 : 0;
  const wallV = k.wallVelocity[b],
    floorV = k.floorExtraVelocity[b],
    ceilingV = k.ceilingVelocity[b];
  const field = k.field;
  const air = k.air;
  const normals = k.normals;
  const R = sc[SCALAR.R];
  const R2 = R * R;
  const nh = k.hoodCount;
  const hoods = k.hoods;
  const seg = k.seg;
  const at = k.at;
  const rng = k.rng;
  const residence = k.zoneResidence_s;
  const draftX = sc[SCALAR.draftX],
    draftY = sc[SCALAR.draftY],
    zoneFloor_m = sc[SCALAR.zoneFloor],
    hoodFloor_m = sc[SCALAR.hoodFloor];
  const cx = sc[SCALAR.cx],
    cy = sc[SCALAR.cy],
    cz = sc[SCALAR.cz],
    maxStep_s = sc[SCALAR.maxStep],
    minStep_s = sc[SCALAR.minStep];
  const stepFraction = sc[SCALAR.stepFraction],
    driftFraction = sc[SCALAR.driftFraction],
    midpointLimit = sc[SCALAR.midpointLimit];
  const invBin = sc[SCALAR.invBin],
    lastBin = k.lastBin | 0,
    nBins = k.nBins | 0;
  const L = sc[SCALAR.L],
    W = sc[SCALAR.W],
    H = sc[SCALAR.H],
    wrapX = sc[SCALAR.wrapX] > 0 ? 1 : 0,
    wrapY = sc[SCALAR.wrapY] > 0 ? 1 : 0;
  const outerR2 = (R + zoneFloor_m) * (R + zoneFloor_m);
  const innerR2 = zoneFloor_m < R ? (R - zoneFloor_m) * (R - zoneFloor_m) : -1;
  const normalBlock = NORMAL_BLOCK | 0;
  const inertial = tau > minStep_s ? 1 : 0;
  const sqrtPi = Math.sqrt(Math.PI);
  // Variance reduction (importance.ts); the animated sample walks plainly so every path is whole.
  const reduce = sc[SCALAR.reduce] > 0 && a.slot[i] < 0 ? 1 : 0;
  const w = a.w[i];
  let tier = a.level[i];
  let deep = a.deep[i];
  const inward2 = k.inward2,
    outward2 = k.outward2,
    target = k.target;
  let inR2 = inward2[tier],
    outR2 = outward2[tier];
  const nearFace_m = sc[SCALAR.nearFace],
    leaveFace_m = sc[SCALAR.leaveFace],
    pecletIn = sc[SCALAR.pecletIn],
    pecletOut = sc[SCALAR.pecletOut],
    deepFactor = sc[SCALAR.deepFactor];
  let n = k.normalIndex;
  let fate = -1;
  let steps = 0;
  while (steps < STEPS_PER_VISIT) {
    const ex = x - cx;
    const ey = y - cy;
    const ez = z - cz;
    const r2 = ex * ex + ey * ey + ez * ez;
    // |r − R| is under its floor F for (R − F)² ≤ r² ≤ (R + F)², where d is F without a root.
    let d = zoneFloor_m;
    if (r2 > outerR2 || r2 < innerR2) {
      d = Math.sqrt(r2) - R;
      if (d < 0) d = -d;
      if (d < zoneFloor_m) d = zoneFloor_m;
    }
    at[0] = x;
    at[1] = y;
    at[2] = z;
    airAt(k, 1);
    let jetD = air[6];
    let vx = air[0];
    let vy = air[1];
    let vz = air[2];
    const dh = air[3] < hoodFloor_m ? hoodFloor_m : air[3];
    const dj = air[4];
    const dMax = brownian + roomD + jetD;
    let speed = Math.abs(vx) + Math.abs(vy) + Math.abs(vz - vs);
    if (inertial) {
      // Released moving with the air it is thrown in: its own stop distance V·τ is what inertia adds.
      if (ux !== ux) {
        ux = vx;
        uy = vy;
        uz = vz - vs;
      }
      const own = Math.abs(ux) + Math.abs(uy) + Math.abs(uz);
      if (own > speed) speed = own;
    }
    if (reduce) {
      let changed = 0;
      if (r2 < inR2) {
        tier++;
        changed = 1;
      } else if (r2 > outR2) {
        tier--;
        changed = 1;
      }
      if (changed) {
        inR2 = inward2[tier];
        outR2 = outward2[tier];
      }
      // Deep in a capture region: the hood's own drift over the distance to its face beats
      // diffusion (a local Péclet number), and the particle is no nearer the zone than the source.
      const carried = air[5] * dh;
      const isDeep = deep
        ? dh < leaveFace_m && carried > pecletOut * dMax
          ? 1
          : 0
        : dh < nearFace_m && tier <= 1 && carried > pecletIn * dMax
          ? 1
          : 0;
      if (isDeep !== deep) {
        deep = isDeep;
        changed = 1;
      }
      if (changed) {
        const goal = deep ? deepFactor * target[tier] : target[tier];
        if (w > WINDOW * goal || w * WINDOW < goal) {
          k.pendingTarget = goal;
          fate = REWEIGHT;
          break;
        }
      }
    }
    const zoneLimit_m = stepFraction * d;
    const hoodLimit_m = driftFraction * dh;
    const jetLimit_m = stepFraction * dj;
    let driftLimit_m = zoneLimit_m < hoodLimit_m ? zoneLimit_m : hoodLimit_m;
    if (jetLimit_m < driftLimit_m) driftLimit_m = jetLimit_m;
    let near = dh < d ? dh : d;
    if (dj < near) near = dj;
    let dt = maxStep_s;
    // Without diffusion there is no diffusive limit. Not a ternary with Infinity: the global's load made V8 keep the
    // result as a tagged value and box every step's (32 bytes a step, Node --trace-allocation-stack-interval).
    if (dMax > 0) {
      const diffusive = (stepFraction * stepFraction * near * near) / (18 * dMax);
      if (diffusive < dt) dt = diffusive;
    }
    const drift = driftLimit_m / speed;
    if (drift < dt) dt = drift;
    if (dt < minStep_s) dt = minStep_s;
    if (t + dt > end) dt = end - t;
    const shift = (Math.abs(vx - draftX) + Math.abs(vy - draftY) + Math.abs(vz)) * dt;
    const local = dh < dj ? dh : dj;
    // Air speeds up toward a face, so a start-of-step drift that already enters one is a capture;
    // otherwise the midpoint's (which may lie behind the face, where a flanged face draws nothing).
    if (!inertial && nh > 0) {
      seg[0] = x;
      seg[1] = y;
      seg[2] = z;
      seg[3] = vx * dt;
      seg[4] = vy * dt;
      seg[5] = (vz - vs) * dt;
      if (faceEnteredAt(hoods, nh, seg) >= 0) {
        fate = FATE_CAPTURED;
        break;
      }
    }
    if (shift > midpointLimit * local) {
      // Midpoint drift: the hood and jet fields change along the step, and a start-of-step velocity
      // would lag behind them (Euler), biasing capture low by a few per cent at the default step.
      const half = 0.5 * dt;
      at[0] = x + half * vx;
      at[1] = y + half * vy;
      at[2] = z + half * vz;
      airAt(k, 0);
      jetD = air[6];
      vx = air[0];
      vy = air[1];
      vz = air[2];
    }
    if (r2 < R2) {
      k.zoneVisited[k.ids[i]] = 1;
      let tb = (t * invBin) | 0;
      if (tb > lastBin) tb = lastBin;
      residence[tb * nBins + b] += dt * w;
    }
    if (a.slot[i] >= 0) {
      seg[0] = t;
      seg[1] = x;
      seg[2] = y;
      seg[3] = z;
      recordFrames(k, a.slot[i]);
    }
    let dx = vx * dt;
    let dy = vy * dt;
    let dz = (vz - vs) * dt;
    if (inertial) {
      // dv/dt = (u − v)/τ + g integrated exactly over the step with the air velocity u held at its
      // midpoint value: v relaxes toward u − V_TS·ẑ (Hinds ch. 5), so large particles overshoot.
      IO[0] = -dt / tau;
      expIO();
      const decay = IO[0];
      const lag = tau * (1 - decay);
      const tx = vx;
      const ty = vy;
      const tz = vz - vs;
      dx = tx * dt + (ux - tx) * lag;
      dy = ty * dt + (uy - ty) * lag;
      dz = tz * dt + (uz - tz) * lag;
      ux = tx + (ux - tx) * decay;
      uy = ty + (uy - ty) * decay;
      uz = tz + (uz - tz) * decay;
    }
    if (nh > 0) {
      seg[0] = x;
      seg[1] = y;
      seg[2] = z;
      seg[3] = dx;
      seg[4] = dy;
      seg[5] = dz;
      if (faceEnteredAt(hoods, nh, seg) >= 0) {
        fate = FATE_CAPTURED;
        break;
      }
    }
    const xd = x + dx;
    const yd = y + dy;
    const zd = z + dz;
    if (zd < 0) {
      // Settling (or a downward drift) carries it onto the floor within this step.
      t += (dt * z) / (z - zd);
      x += (dx * z) / (z - zd);
      y += (dy * z) / (z - zd);
      z = 0;
      fate = FATE_SETTLED;
      break;
    }
    let variance = 2 * (brownian + jetD) * dt;
    if (t < youngUntil && lagrangian > 0) {
      IO[0] = -(t - born) / lagrangian;
      expIO();
      const grown = IO[0];
      IO[0] = -dt / lagrangian;
      expm1IO();
      const fade = grown * -IO[0];
      variance += 2 * roomD * (dt - lagrangian * fade);
    } else {
      variance += 2 * roomD * dt;
    }
    const sigma = Math.sqrt(variance);
    // Hit probability per reflection, v_d·√(π·dt/D) = v_d·√(2π)·dt/σ.
    const hitScale = sigma > 0 ? (sqrtPi * Math.SQRT2 * dt) / sigma : 0;
    if (n === normalBlock) {
      fillNormals(rng, normals);
      n = 0;
    }
    let x1 = xd + sigma * normals[n];
    let y1 = yd + sigma * normals[n + 1];
    let z1 = zd + sigma * normals[n + 2];
    n += 3;
    if (nh > 0) {
      seg[0] = xd;
      seg[1] = yd;
      seg[2] = zd;
      seg[3] = x1;
      seg[4] = y1;
      seg[5] = z1;
      if (reflectAtFacesAt(hoods, nh, seg, field) > 0) {
        x1 = field[0];
        y1 = field[1];
        z1 = field[2];
      }
    }
    let absorbed = 0;
    // Walls inline: a call here would box x, y and z on every step, not just at the wall.
    if (x1 < 0 || x1 > L) {
      if (wrapX) {
        while (x1 < 0) x1 += L;
        while (x1 > L) x1 -= L;
      } else {
        while (x1 < 0 || x1 > L) x1 = x1 < 0 ? -x1 : 2 * L - x1;
        if (collects && rng.nextUniform() < wallV * hitScale) absorbed = 1;
      }
    }
    if (y1 < 0 || y1 > W) {
      if (wrapY) {
        while (y1 < 0) y1 += W;
        while (y1 > W) y1 -= W;
      } else {
        while (y1 < 0 || y1 > W) y1 = y1 < 0 ? -y1 : 2 * W - y1;
        if (collects && rng.nextUniform() < wallV * hitScale) absorbed = 1;
      }
    }
    if (z1 < 0 || z1 > H) {
      const floorHit = z1 < 0 ? 1 : 0;
      while (z1 < 0 || z1 > H) z1 = z1 < 0 ? -z1 : 2 * H - z1;
      // Settling already carries V_TS·C onto the floor; it collects only the rest of v_du.
      if (collects && rng.nextUniform() < (floorHit ? floorV : ceilingV) * hitScale) absorbed = floorHit ? 2 : 1;
    }
    x = x1;
    y = y1;
    z = z1;
    t += dt;
    steps++;
    if (absorbed) {
      fate = absorbed === 2 ? FATE_SETTLED : FATE_WALLS;
      if (absorbed === 2) z = 0;
      break;
    }
    if (t >= end) {
      fate = end >= duration ? FATE_AIRBORNE : wallAt <= exhaustAt ? FATE_WALLS : FATE_EXHAUSTED;
      break;
    }
  }
  k.normalIndex = n;
  k.steps += steps;
  a.x[i] = x;
  a.y[i] = y;
  a.z[i] = z;
  a.t[i] = t;
  a.ux[i] = ux;
  a.uy[i] = uy;
  a.uz[i] = uz;
  a.level[i] = tier;
  a.deep[i] = deep;
  return fate;
}
