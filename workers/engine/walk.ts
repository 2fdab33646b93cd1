import { CAPTURE_DEPTH_m, evaluateHoods } from './hood-field.ts';
import { type Kernel, NORMAL_BLOCK } from './kernel.ts';
import { fillNormals } from './ziggurat.ts';

const STEPS_PER_VISIT = 64;

/**
 * Advances particle i by up to STEPS_PER_VISIT steps; returns its fate (0 captured, 1 settled,
 * 2 exhausted, 3 airborne at the end) or −1 while it lives. Allocation-free arithmetic only.
 *
 * One function on purpose (over 150 lines): V8 does not inline a call this size, and a call
 * per hood evaluation cost a third of the time. A single hood, the common case, is evaluated
 * inline on locals with the operations of evaluateHoods, so both give bit-identical fields;
 * several hoods take the general function.
 */
export function walk(k: Kernel, i: number): number {
  const a = k.a;
  let x = a.x[i];
  let y = a.y[i];
  let z = a.z[i];
  let t = a.t[i];
  const b = a.bin[i];
  const duration = k.duration;
  const end = a.exhaustAt[i] < duration ? a.exhaustAt[i] : duration;
  const vs = k.settling[b];
  const s2D = k.sqrt2D[b];
  const dFactor = k.diffusionFactor[b];
  const sl = a.slot[i];
  const field = k.field;
  const normals = k.normals;
  const R = k.R;
  const R2 = R * R;
  const nh = k.hoodCount;
  const single = nh === 1;
  const hoods = k.hoods;
  const rng = k.rng;
  const residence = k.zoneResidence_s;
  // Unary plus marks every scalar as a plain double: a loop variable assigned from a field (vx, vy,
  // d, dh) would otherwise stay tagged and box a heap number on every step (about 70 B/step), and
  // each use of a tagged constant re-checks its map.
  const draftX = +k.draftX, draftY = +k.draftY, zoneFloor_m = +k.zoneFloor_m, hoodFloor_m = +k.hoodFloor_m;
  const cx = +k.cx, cy = +k.cy, cz = +k.cz, maxStep_s = +k.maxStep_s, minStep_s = +k.minStep_s;
  const stepFraction = +k.stepFraction, driftFraction = +k.driftFraction, midpointLimit = +k.midpointLimit;
  const invBin = +k.invBin, lastBin = k.lastBin | 0, nBins = k.nBins | 0;
  const L = +k.L, W = +k.W, H = +k.H, wrapX = k.wrapX, wrapY = k.wrapY;
  const h0 = k.h0;
  const hx = +h0.x, hy = +h0.y, hz = +h0.z, nx = +h0.nx, ny = +h0.ny, nz = +h0.nz;
  const e1x = +h0.e1x, e1y = +h0.e1y, e1z = +h0.e1z, e2x = +h0.e2x, e2y = +h0.e2y, e2z = +h0.e2z;
  const halfWidth = +h0.halfWidth, halfHeight = +h0.halfHeight, reach = +h0.reach, boothDepth = +h0.boothDepth;
  const airflow = +h0.airflow, area = +h0.area, coefficient = +h0.coefficient, slotCoefficient = +h0.slotCoefficient;
  const faceVelocity = +h0.faceVelocity, slot = h0.slot, flanged = h0.flanged, booth = h0.booth;
  const outerR2 = (R + zoneFloor_m) * (R + zoneFloor_m);
  const innerR2 = zoneFloor_m < R ? (R - zoneFloor_m) * (R - zoneFloor_m) : -1;
  const still = airflow === 0;
  let n = k.normalIndex;
  const diffusivity = 0.5 * s2D * s2D;
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
      if (onFace && ah <= 0 && ah > -CAPTURE_DEPTH_m) {
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
        if (product_m2 < 20 * scale_m2 && rng.nextUniform() < Math.exp(-product_m2 / scale_m2)) {
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
          let resistance = slot ? slotCoefficient * r : coefficient * (10 * s2 + area);
          if (resistance < area) resistance = area;
          const k2 = airflow / (resistance * s2);
          const scale = flanged ? k2 * r : 0.5 * k2 * (r + ah);
          vx -= scale * sx;
          vy -= scale * sy;
          vz -= scale * sz;
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
        if (product_m2 < 20 * scale_m2 && rng.nextUniform() < Math.exp(-product_m2 / scale_m2)) {
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
    const near = Math.min(dh, d);
    const drift = Math.min(stepFraction * d, driftFraction * dh) / speed;
    const dt0 = Math.min(dFactor * near * near, maxStep_s, drift);
    let dt = Math.max(dt0, minStep_s);
    if (t + dt > end) dt = end - t;
    const hoodShift = (Math.abs(vx - draftX) + Math.abs(vy - draftY) + Math.abs(vz)) * dt;
    if (hoodShift > midpointLimit * dh) {
      // Midpoint drift: the hood field grows toward the face, and a start-of-step velocity would
      // lag behind it (Euler), biasing capture low by a few per cent at the default step.
      const mx = x + 0.5 * dt * vx;
      const my = y + 0.5 * dt * vy;
      const mz = z + 0.5 * dt * vz;
      if (single) {
        const rx = mx - hx;
        const ry = my - hy;
        const rz = mz - hz;
        const ah = rx * nx + ry * ny + rz * nz;
        const u = rx * e1x + ry * e1y + rz * e1z;
        const v = rx * e2x + ry * e2y + rz * e2z;
        const onFace = Math.abs(u) <= halfWidth && Math.abs(v) <= halfHeight;
        if (!(onFace && ah <= 0 && ah > -CAPTURE_DEPTH_m)) {
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
          vx = draftX;
          vy = draftY;
          vz = 0;
          if (r !== 0) {
            if (booth && ah >= 0 && onFace && ah <= boothDepth) {
              vx -= faceVelocity * nx;
              vy -= faceVelocity * ny;
              vz -= faceVelocity * nz;
            } else if (!flanged || ah > 0) {
              let resistance = slot ? slotCoefficient * r : coefficient * (10 * s2 + area);
              if (resistance < area) resistance = area;
              const k2 = airflow / (resistance * s2);
              const scale = flanged ? k2 * r : 0.5 * k2 * (r + ah);
              vx -= scale * sx;
              vy -= scale * sy;
              vz -= scale * sz;
            }
          }
        }
      } else {
        field[0] = draftX;
        field[1] = draftY;
        field[2] = 0;
        if (evaluateHoods(hoods, nh, mx, my, mz, field) < 0) {
          vx = field[0];
          vy = field[1];
          vz = field[2];
        }
      }
    }
    if (r2 < R2) {
      let tb = (t * invBin) | 0;
      if (tb > lastBin) tb = lastBin;
      residence[tb * nBins + b] += dt;
    }
    if (sl >= 0) recordFrames(k, sl, t, x, y, z);
    if (n === NORMAL_BLOCK) {
      fillNormals(rng, normals);
      n = 0;
    }
    lastDt = dt;
    const sigma = s2D * Math.sqrt(dt);
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
