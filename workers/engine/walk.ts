import * as fit from '../../shared/physics/hoods';
import { CAPTURE_DEPTH_m, evaluateHoods } from './hood-field';
import * as slots from './hood-slots';
import { type Kernel, NORMAL_BLOCK, SCALAR } from './kernel';
import { fillNormals } from './ziggurat';

// Module-level copies of imported numbers, which V8 compiles as literals (see hood-field.ts).
const { OPENING_DISTANCE_FACTOR } = fit;
const {
  HOOD_AIRFLOW,
  HOOD_AREA,
  HOOD_BOOTH_DEPTH,
  HOOD_COEFFICIENT,
  HOOD_E1X,
  HOOD_E1Y,
  HOOD_E1Z,
  HOOD_E2X,
  HOOD_E2Y,
  HOOD_E2Z,
  HOOD_FACE_VELOCITY,
  HOOD_HALF_HEIGHT,
  HOOD_HALF_WIDTH,
  HOOD_KIND,
  HOOD_NX,
  HOOD_NY,
  HOOD_NZ,
  HOOD_REACH,
  HOOD_WIDTH,
  HOOD_X,
  HOOD_Y,
  HOOD_Z,
  KIND_BOOTH,
  KIND_FLANGED,
  KIND_FLANGED_SLOT,
  KIND_SLOT,
} = slots;
// The fit's 10·X² and the 20·X of its derivative, from shared/physics so the engine and the hand calculation cannot drift apart.
const GROWTH_FACTOR = 2 * OPENING_DISTANCE_FACTOR;

// Long enough that a visit's set-up (some fifty loads) is small beside its steps, short enough
// that a pass over the live particles still reports progress within a batch. The bridge test
// below starts afresh with each visit (its first step has no previous height).
const STEPS_PER_VISIT = 256;

/**
 * Advances particle i by up to STEPS_PER_VISIT steps; returns its fate (0 captured, 1 settled,
 * 2 exhausted, 3 airborne at the end) or −1 while it lives. Allocation-free arithmetic only.
 *
 * One function on purpose (over 150 lines): V8 does not inline a call this size, and a call
 * per hood evaluation cost a third of the time. A single hood, the common case, is evaluated
 * inline on locals with the operations of evaluateHoods, so both give bit-identical fields;
 * several hoods take the general function, as does a slot's midpoint field (a call on the
 * fewer steps that need it, rather than a second inline copy).
 *
 * The step waits on a chain of roots and divisions, so the loop keeps them off that chain where
 * the arithmetic allows: the random step's spread comes with the bound that set dt (no root of dt),
 * and a single plain or flanged hood's midpoint field is its first-order expansion (no second root
 * and division after dt). Flags are 0/1 integers and minima are ternaries (see below).
 */
export function walk(k: Kernel, i: number): number {
  const a = k.a;
  let x = a.x[i];
  let y = a.y[i];
  let z = a.z[i];
  let t = a.t[i];
  const b = a.bin[i];
  // Settings come from Float64Arrays (see SCALAR): always doubles, so the compiled loop suits every
  // scenario. A loop variable started from an object field (vx, vy, d, dh) would also stay tagged
  // and box a heap number on every step.
  const sc = k.scalars;
  const duration = sc[SCALAR.duration];
  const end = a.exhaustAt[i] < duration ? a.exhaustAt[i] : duration;
  const vs = k.settling[b];
  const s2D = k.sqrt2D[b];
  const dFactor = k.diffusionFactor[b];
  const sl = a.slot[i];
  const field = k.field;
  const normals = k.normals;
  const R = sc[SCALAR.R];
  const R2 = R * R;
  const nh = k.hoodCount;
  const single = nh === 1 ? 1 : 0;
  const hoods = k.hoods;
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
  // Flags as 0/1 integers: a boolean read from an object is tested as an unknown value (several
  // compares per use); an integer is one test.
  const L = sc[SCALAR.L],
    W = sc[SCALAR.W],
    H = sc[SCALAR.H],
    wrapX = sc[SCALAR.wrapX] > 0 ? 1 : 0,
    wrapY = sc[SCALAR.wrapY] > 0 ? 1 : 0;
  // Hood 0 in packHoods' layout.
  const h0 = k.hood0;
  const kind = h0[HOOD_KIND];
  const hx = h0[HOOD_X],
    hy = h0[HOOD_Y],
    hz = h0[HOOD_Z],
    nx = h0[HOOD_NX],
    ny = h0[HOOD_NY],
    nz = h0[HOOD_NZ];
  const e1x = h0[HOOD_E1X],
    e1y = h0[HOOD_E1Y],
    e1z = h0[HOOD_E1Z],
    e2x = h0[HOOD_E2X],
    e2y = h0[HOOD_E2Y],
    e2z = h0[HOOD_E2Z];
  const halfWidth = h0[HOOD_HALF_WIDTH],
    halfHeight = h0[HOOD_HALF_HEIGHT],
    airflow = h0[HOOD_AIRFLOW],
    area = h0[HOOD_AREA],
    coefficient = h0[HOOD_COEFFICIENT];
  const faceVelocity = h0[HOOD_FACE_VELOCITY],
    slotCoefficient = coefficient * h0[HOOD_WIDTH],
    reach = h0[HOOD_REACH],
    boothDepth = h0[HOOD_BOOTH_DEPTH];
  const slot = kind === KIND_SLOT || kind === KIND_FLANGED_SLOT ? 1 : 0;
  const flanged = kind === KIND_FLANGED || kind === KIND_FLANGED_SLOT || kind === KIND_BOOTH ? 1 : 0,
    booth = kind === KIND_BOOTH ? 1 : 0;
  const captureDepth_m = +CAPTURE_DEPTH_m,
    normalBlock = NORMAL_BLOCK | 0;
  const outerR2 = (R + zoneFloor_m) * (R + zoneFloor_m);
  const innerR2 = zoneFloor_m < R ? (R - zoneFloor_m) * (R - zoneFloor_m) : -1;
  const still = airflow === 0 ? 1 : 0;
  const perAirflow = airflow > 0 ? 1 / airflow : 0;
  let n = k.normalIndex;
  const diffusivity = 0.5 * s2D * s2D;
  // Loaded, not computed here: TurboFan would move a pure s2D·√maxStep into the loop.
  const sigmaPerNear = k.sigmaPerNear[b],
    sigmaMax = k.sigmaMax[b],
    sigmaMin = k.sigmaMin[b];
  let fate = -1;
  let steps = 0;
  let lastHood = -1;
  let lastHeight = 0;
  let lastDt = 0;
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
    let dh = Infinity;
    let jPhi = 0,
      jB = 0,
      jC = 0,
      jSx = 0,
      jSy = 0,
      jSz = 0;
    let vx = draftX;
    let vy = draftY;
    let vz = 0;
    if (single) {
      const rx = x - hx;
      const ry = y - hy;
      const rz = z - hz;
      const ah = rx * nx + ry * ny + rz * nz;
      const u = rx * e1x + ry * e1y + rz * e1z;
      const v = rx * e2x + ry * e2y + rz * e2z;
      const onFace = Math.abs(u) <= halfWidth && Math.abs(v) <= halfHeight;
      if (onFace && ah <= 0 && ah > -captureDepth_m) {
        fate = 0;
        break;
      }
      let sx = rx;
      let sy = ry;
      let sz = rz;
      if (slot) {
        const along = u > halfWidth ? halfWidth : u < -halfWidth ? -halfWidth : u;
        sx -= along * e1x;
        sy -= along * e1y;
        sz -= along * e1z;
      }
      const s2 = sx * sx + sy * sy + sz * sz;
      const r = Math.sqrt(s2);
      const aa = ah < 0 ? -ah : ah;
      const bound = r - reach;
      const face = bound > aa ? bound : aa;
      // Brownian bridge: a walk that starts and ends in front of a face may have touched it in
      // between, with probability exp(−a₀a₁/(D·dt)); sampling it removes the O(√dt) capture deficit.
      const height = onFace ? ah : -1;
      if (height > 0 && lastHeight > 0) {
        const scale_m2 = diffusivity * lastDt;
        const product_m2 = height * lastHeight;
        if (product_m2 < 20 * scale_m2 && bridgeCrossed(rng.nextUniform(), product_m2 / scale_m2)) {
          fate = 0;
          break;
        }
      }
      lastHeight = height;
      dh = face < hoodFloor_m ? hoodFloor_m : face;
      if (!still && r !== 0) {
        if (booth && ah >= 0 && onFace && ah <= boothDepth) {
          vx -= faceVelocity * nx;
          vy -= faceVelocity * ny;
          vz -= faceVelocity * nz;
        } else if (!flanged || ah > 0) {
          let resistance = slot ? slotCoefficient * r : coefficient * (OPENING_DISTANCE_FACTOR * s2 + area);
          let growth = GROWTH_FACTOR * coefficient;
          if (resistance < area) {
            resistance = area;
            growth = 0;
          }
          const k2 = airflow / (resistance * s2);
          const scale = flanged ? k2 * r : 0.5 * k2 * (r + ah);
          vx -= scale * sx;
          vy -= scale * sy;
          vz -= scale * sz;
          // The field's derivative along a displacement u for the midpoint below, without a
          // division: 1/s² and 1/R come from k2 = Q/(R·s²). With res' = dR/dr / r = 20·C (0 where R is
          // held at A): flanged, J·u = −φ·u + φ·(s·u)·(res'/R + 1/s²)·s with φ = k2·r; plain, φ = k2·(r + a)/2
          // and J·u = −φ·u − [k2/2·((s·u)·(1/r − (r + a)·(res'/R + 2/s²)) + n·u)]·s.
          const perS2 = resistance * k2 * perAirflow;
          const perResistance = s2 * k2 * perAirflow;
          jPhi = scale;
          jSx = sx;
          jSy = sy;
          jSz = sz;
          if (flanged) {
            jB = scale * (growth * perResistance + perS2);
            jC = 0;
          } else {
            jB = -0.5 * k2 * (r * perS2 - (r + ah) * (growth * perResistance + 2 * perS2));
            jC = -0.5 * k2;
          }
        }
      }
    } else if (nh > 1) {
      field[0] = vx;
      field[1] = vy;
      field[2] = 0;
      if (evaluateHoods(hoods, nh, x, y, z, field) >= 0) {
        fate = 0;
        break;
      }
      const hood = field[4];
      const height = field[5];
      if (hood === lastHood && height > 0 && lastHeight > 0) {
        const scale_m2 = diffusivity * lastDt;
        const product_m2 = height * lastHeight;
        if (product_m2 < 20 * scale_m2 && bridgeCrossed(rng.nextUniform(), product_m2 / scale_m2)) {
          fate = 0;
          break;
        }
      }
      lastHood = hood;
      lastHeight = height;
      dh = field[3] < hoodFloor_m ? hoodFloor_m : field[3];
      vx = field[0];
      vy = field[1];
      vz = field[2];
    }
    const vzs = vz - vs;
    const speed = Math.abs(vx) + Math.abs(vy) + Math.abs(vzs);
    // Ternaries, not Math.min/max: those also order −0 and NaN (several branches each), which
    // cannot occur here.
    const near = dh < d ? dh : d;
    const zoneLimit_m = stepFraction * d;
    const hoodLimit_m = driftFraction * dh;
    const driftLimit_m = zoneLimit_m < hoodLimit_m ? zoneLimit_m : hoodLimit_m;
    // The random step's spread s2D·√dt comes with its bound, so no root waits for dt: the diffusive
    // bound's root is known (sigmaPerNear·near) and the drift bound's runs beside its division.
    const perSpeed = 1 / speed;
    const drift = driftLimit_m * perSpeed;
    const diffusive = dFactor * near * near;
    let dt = maxStep_s;
    let sigma = sigmaMax;
    if (diffusive < maxStep_s) {
      dt = diffusive;
      sigma = sigmaPerNear * near;
    }
    if (drift < dt) {
      dt = drift;
      sigma = s2D * Math.sqrt(driftLimit_m * speed) * perSpeed;
    }
    if (dt < minStep_s) {
      dt = minStep_s;
      sigma = sigmaMin;
    }
    if (t + dt > end) {
      dt = end - t;
      sigma = s2D * Math.sqrt(dt);
    }
    const hoodShift = (Math.abs(vx - draftX) + Math.abs(vy - draftY) + Math.abs(vz)) * dt;
    if (hoodShift > midpointLimit * dh) {
      // Midpoint drift: the hood field grows toward the face, and a start-of-step velocity would
      // lag behind it (Euler), biasing capture low by a few per cent at the default step.
      const half = 0.5 * dt;
      if (single && !slot) {
        // The field at the midpoint to first order, v + (dt/2)·J·u: second order like the full
        // evaluation, without its root and division after dt (slots take the full evaluation).
        const su = jSx * vx + jSy * vy + jSz * vz;
        const g = jB * su + jC * (nx * vx + ny * vy + nz * vz);
        const dvx = half * (g * jSx - jPhi * vx);
        const dvy = half * (g * jSy - jPhi * vy);
        const dvz = half * (g * jSz - jPhi * vz);
        vx += dvx;
        vy += dvy;
        vz += dvz;
      } else {
        // Slots and several hoods: the field again at the midpoint (for one hood evaluateHoods
        // gives the inline field above bit for bit); reaching a face there keeps the step's drift.
        field[0] = draftX;
        field[1] = draftY;
        field[2] = 0;
        if (evaluateHoods(hoods, nh, x + half * vx, y + half * vy, z + half * vz, field) < 0) {
          vx = field[0];
          vy = field[1];
          vz = field[2];
        }
      }
    }
    if (r2 < R2) {
      k.zoneVisited[k.ids[i]] = 1;
      let tb = (t * invBin) | 0;
      if (tb > lastBin) tb = lastBin;
      residence[tb * nBins + b] += dt;
    }
    if (sl >= 0) recordFrames(k, sl, t, x, y, z);
    if (n === normalBlock) {
      fillNormals(rng, normals);
      n = 0;
    }
    lastDt = dt;
    x += vx * dt + sigma * normals[n];
    y += vy * dt + sigma * normals[n + 1];
    let zz = z + vz * dt + sigma * normals[n + 2];
    n += 3;
    // Walls inline: a call here would box x, y and z on every step, not just at the wall.
    if (x < 0 || x > L) {
      if (wrapX) {
        while (x < 0) x += L;
        while (x > L) x -= L;
      } else {
        while (x < 0 || x > L) x = x < 0 ? -x : 2 * L - x;
      }
    }
    if (y < 0 || y > W) {
      if (wrapY) {
        while (y < 0) y += W;
        while (y > W) y -= W;
      } else {
        while (y < 0 || y > W) y = y < 0 ? -y : 2 * W - y;
      }
    }
    while (zz < 0 || zz > H) zz = zz < 0 ? -zz : 2 * H - zz;
    // Diffusion reflects at the floor; only settling carries a particle onto it, so the
    // deposition flux is V_TS·C at the floor, as in the well-mixed settling loss V_TS/H.
    z = zz - vs * dt;
    t += dt;
    steps++;
    if (z < 0) {
      t += z / vs;
      z = 0;
      fate = 1;
      break;
    }
    if (t >= end) {
      fate = end < duration ? 2 : 3;
      break;
    }
  }
  k.normalIndex = n;
  k.steps += steps;
  a.x[i] = x;
  a.y[i] = y;
  a.z[i] = z;
  a.t[i] = t;
  return fate;
}

/**
 * u < exp(−q) decided mostly without exp: 1 − q ≤ exp(−q) ≤ 1/(1 + q), so u below the first is a
 * crossing and u at or above the second is not; only draws in between need the exponential.
 */
function bridgeCrossed(u: number, q: number): boolean {
  if (u < 1 - q) return true;
  if (u * (1 + q) >= 1) return false;
  return u < Math.exp(-q);
}

function recordFrames(k: Kernel, sl: number, t: number, x: number, y: number, z: number): void {
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
