import { describe, it, expect } from 'vitest';
import { hoodCenterlineVelocity, hoodFace, sinkPanelVelocity } from './index';
import type { Hood, HoodFace } from './index';

const out = new Float64Array(3);

function velocity(face: HoodFace, airflow_m3PerS: number, x: number, y: number, z: number): Float64Array {
  sinkPanelVelocity(x, y, z, face.halfWidth_m, face.halfHeight_m, airflow_m3PerS, face.frontShare, out);
  return out;
}

// Inflow through a sphere of radius r about the face centre, midpoint rule in cos θ and φ.
function sphereInflow(face: HoodFace, airflow: number, radius_m: number, n = 240): number {
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const mu = -1 + (2 * (i + 0.5)) / n;
    const rho = Math.sqrt(1 - mu * mu);
    for (let j = 0; j < n; j++) {
      const phi = (2 * Math.PI * (j + 0.5)) / n;
      const nx = rho * Math.cos(phi);
      const ny = rho * Math.sin(phi);
      const u = velocity(face, airflow, radius_m * nx, radius_m * ny, radius_m * mu);
      sum -= u[0] * nx + u[1] * ny + u[2] * mu;
    }
  }
  return (sum * radius_m * radius_m * 4 * Math.PI) / (n * n);
}

// Inflow through an axis-aligned box [−hx, hx] × [−hy, hy] × [zLo, zHi], midpoint rule on each face.
function boxInflow(face: HoodFace, airflow: number, hx: number, hy: number, zLo: number, zHi: number, n = 160): number {
  const mid = (lo: number, hi: number, k: number) => lo + ((hi - lo) * (k + 0.5)) / n;
  const dx = (2 * hx) / n;
  const dy = (2 * hy) / n;
  const dz = (zHi - zLo) / n;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const x = mid(-hx, hx, i);
      const y = mid(-hy, hy, j);
      const zi = mid(zLo, zHi, i);
      const zj = mid(zLo, zHi, j);
      sum += (velocity(face, airflow, x, y, zLo)[2] - velocity(face, airflow, x, y, zHi)[2]) * dx * dy;
      sum += (velocity(face, airflow, -hx, y, zi)[0] - velocity(face, airflow, hx, y, zi)[0]) * dy * dz;
      sum += (velocity(face, airflow, x, -hy, zj)[1] - velocity(face, airflow, x, hy, zj)[1]) * dx * dz;
    }
  }
  return sum;
}

const HOODS: Hood[] = [
  { kind: 'plain', faceArea_m2: 0.1, airflow_m3PerS: 0.5 },
  { kind: 'flanged', faceArea_m2: 0.1, airflow_m3PerS: 0.5 },
  { kind: 'slot', faceArea_m2: 0.05, slotLength_m: 1, airflow_m3PerS: 0.74 },
  { kind: 'flanged-slot', faceArea_m2: 0.05, slotLength_m: 1, airflow_m3PerS: 0.74 },
  { kind: 'booth', faceArea_m2: 2, airflow_m3PerS: 1 },
];

describe('sinkPanelVelocity: a uniformly drawing face carries its airflow', () => {
  it.each(HOODS)('draws Q through spheres of 1.1, 2 and 5 half-diagonals around a $kind face (Gauss theorem, [C] quadrature)', (hood) => {
    const face = hoodFace(hood);
    const halfDiagonal_m = Math.hypot(face.halfWidth_m, face.halfHeight_m);
    for (const k of [1.1, 2, 5]) {
      const inflow = sphereInflow(face, hood.airflow_m3PerS, k * halfDiagonal_m);
      expect(Math.abs(inflow / hood.airflow_m3PerS - 1)).toBeLessThan(0.02);
    }
  });

  it.each(HOODS)('draws Q through a tight box and a long box around a $kind face (Gauss theorem, [C] quadrature)', (hood) => {
    const face = hoodFace(hood);
    const boxes: [number, number, number, number][] = [
      [1.2 * face.halfWidth_m, 1.5 * face.halfHeight_m + 0.02, -0.1, 0.1],
      [2 * face.halfWidth_m, 2 * face.halfHeight_m + 0.5, -0.3, 2],
    ];
    for (const [hx, hy, zLo, zHi] of boxes) {
      expect(Math.abs(boxInflow(face, hood.airflow_m3PerS, hx, hy, zLo, zHi) / hood.airflow_m3PerS - 1)).toBeLessThan(0.02);
    }
  });

  it('meets the face at the face velocity Q/A everywhere on a flanged face (a uniform sheet: normal jump = σ)', () => {
    const face = hoodFace({ kind: 'flanged', faceArea_m2: 0.1 });
    for (const [x, y] of [
      [0, 0],
      [0.1, -0.05],
      [-0.15, 0.15],
    ]) {
      expect(-velocity(face, 0.5, x, y, 1e-9)[2]).toBeCloseTo(0.5 / 0.1, 6);
    }
    expect(Math.abs(velocity(face, 0.5, 0, 0, -0.01)[2])).toBe(0);
  });

  it('draws Q/(2A) from each side of a free sheet and 0.75·Q/A in front, 0.25·Q/A behind a plain face', () => {
    const free = { ...hoodFace({ kind: 'plain', faceArea_m2: 0.1 }), frontShare: 0.5 };
    expect(-velocity(free, 0.5, 0.05, 0.02, 1e-9)[2]).toBeCloseTo(2.5, 6);
    expect(velocity(free, 0.5, 0.05, 0.02, -1e-9)[2]).toBeCloseTo(2.5, 6);
    const plain = hoodFace({ kind: 'plain', faceArea_m2: 0.1 });
    expect(-velocity(plain, 0.5, 0, 0, 1e-9)[2]).toBeCloseTo(3.75, 6);
    expect(velocity(plain, 0.5, 0, 0, -1e-9)[2]).toBeCloseTo(1.25, 6);
  });

  it('is divergence-free off the face (central differences, [C] Laplace)', () => {
    const face = hoodFace({ kind: 'flanged-slot', faceArea_m2: 0.05, slotLength_m: 1 });
    const h = 1e-4;
    for (const [x, y, z] of [
      [0.3, 0.02, 0.05],
      [0.6, -0.2, 0.3],
      [-1.3, 0.5, 0.1],
    ]) {
      const terms = [0, 1, 2].map((axis) => {
        const step = [0, 0, 0];
        step[axis] = h;
        const ahead = velocity(face, 1, x + step[0], y + step[1], z + step[2])[axis];
        const behind = velocity(face, 1, x - step[0], y - step[1], z - step[2])[axis];
        return (ahead - behind) / (2 * h);
      });
      const divergence = terms[0] + terms[1] + terms[2];
      expect(Math.abs(divergence)).toBeLessThan(1e-5 * Math.max(...terms.map(Math.abs)));
    }
  });
});

// Largest relative gap to the published centre line from 0.5·√A to 1.5 equivalent diameters √(4A/π).
function worstCentreLineGap(hood: Hood): number {
  const face = hoodFace(hood);
  const from_m = 0.5 * Math.sqrt(hood.faceArea_m2);
  const to_m = 1.5 * Math.sqrt((4 * hood.faceArea_m2) / Math.PI);
  let worst = 0;
  for (let i = 0; i <= 20; i++) {
    const x_m = from_m + ((to_m - from_m) * i) / 20;
    const gap = -velocity(face, hood.airflow_m3PerS, 0, 0, x_m)[2] / hoodCenterlineVelocity(hood, x_m) - 1;
    if (Math.abs(gap) > Math.abs(worst)) worst = gap;
  }
  return worst;
}

describe('sinkPanelVelocity against the published centre line (Dalla Valle / ACGIH hood-types figure, [S])', () => {
  it('keeps a flanged square face within 15 % from 0.5·√A to 1.5 equivalent diameters', () => {
    expect(Math.abs(worstCentreLineGap(HOODS[1]))).toBeLessThan(0.15);
  });

  it('keeps a plain square face (¾ of the flanged front field, ACGIH flange ratio) within 15 %', () => {
    expect(Math.abs(worstCentreLineGap(HOODS[0]))).toBeLessThan(0.15);
  });

  it('leaves a free sheet (half from each side) far below the plain-opening equation, so it is not the plain model', () => {
    const hood = HOODS[0];
    const face = { ...hoodFace(hood), frontShare: 0.5 };
    const x_m = 0.5 * Math.sqrt(hood.faceArea_m2);
    const ratio = -velocity(face, hood.airflow_m3PerS, 0, 0, x_m)[2] / hoodCenterlineVelocity(hood, x_m);
    expect(ratio).toBeLessThan(0.7);
  });

  it('falls short of the slot equations by more than 15 %: no flat uniform slot reaches 1/(2.6·L·X) (reported, not tuned)', () => {
    const slot = worstCentreLineGap(HOODS[2]);
    const flangedSlot = worstCentreLineGap(HOODS[3]);
    expect(slot).toBeLessThan(-0.15);
    expect(flangedSlot).toBeLessThan(-0.15);
    expect(flangedSlot).toBeGreaterThan(-0.4);
  });

  it('gives a booth its face velocity Q/A at the face ([S] ACGIH: the booth equation is the face velocity)', () => {
    const face = hoodFace(HOODS[4]);
    expect(-velocity(face, 1, 0, 0, 1e-9)[2]).toBeCloseTo(0.5, 6);
  });
});

describe('sinkPanelVelocity near and far', () => {
  it('behaves as a line sink near a flanged slot, Q/(π·L·x), and as a point sink far, Q/(2π·x²) ([C] potential flow)', () => {
    const face = hoodFace({ kind: 'flanged-slot', faceArea_m2: 0.02, slotLength_m: 2 });
    const near = -velocity(face, 1, 0, 0, 0.1)[2];
    expect(Math.abs(near / (1 / (Math.PI * 2 * 0.1)) - 1)).toBeLessThan(0.06);
    const far = -velocity(face, 1, 0, 0, 20)[2];
    expect(Math.abs(far / (1 / (2 * Math.PI * 400)) - 1)).toBeLessThan(0.01);
  });

  it('behaves as Q/(2π·L·x) beside a free slot sheet near and Q/(4π·r²) far, behind it too', () => {
    const face = { ...hoodFace({ kind: 'slot', faceArea_m2: 0.02, slotLength_m: 2 }), frontShare: 0.5 };
    expect(Math.abs(-velocity(face, 1, 0, 0, 0.1)[2] / (1 / (2 * Math.PI * 2 * 0.1)) - 1)).toBeLessThan(0.06);
    expect(Math.abs(velocity(face, 1, 0, 0, -20)[2] / (1 / (4 * Math.PI * 400)) - 1)).toBeLessThan(0.01);
  });

  it('meets the exact flanged circular axis Q/(2π(x² + a²)) far away but draws twice its centre speed at the face ([S] potential flow)', () => {
    const area_m2 = 0.1;
    const a_m = Math.sqrt(area_m2 / Math.PI);
    const face = hoodFace({ kind: 'flanged', faceArea_m2: area_m2 });
    const exact = (x_m: number) => 1 / (2 * Math.PI * (x_m * x_m + a_m * a_m));
    expect(-velocity(face, 1, 0, 0, 0)[2] / exact(0)).toBeCloseTo(2, 6);
    expect(Math.abs(-velocity(face, 1, 0, 0, 5 * a_m)[2] / exact(5 * a_m) - 1)).toBeLessThan(0.03);
  });
});
