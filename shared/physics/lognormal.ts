import { exp, log } from '../det-math/index';
import { type SamplingConvention, conventionFraction } from './conventions';
import { requireAtLeast, requirePositive } from './validate';

export interface HatchChoateDiameters {
  massMedian_m: number;
  surfaceMedian_m: number;
  averageMass_m: number;
  sauter_m: number;
  numberMean_m: number;
}

// Hatch–Choate: ln d = ln CMD + b·(ln σg)² with b = 3, 2, 1.5, 2.5, 0.5 (Hinds Eqs. 4.38–4.53).
export function hatchChoate(countMedian_m: number, gsd: number): HatchChoateDiameters {
  requirePositive('countMedian_m', countMedian_m);
  const lnGsd = log(requireAtLeast('gsd', gsd, 1));
  const lnGsdSquared = lnGsd * lnGsd;
  const shifted = (b: number) => countMedian_m * exp(b * lnGsdSquared);
  return {
    massMedian_m: shifted(3),
    surfaceMedian_m: shifted(2),
    averageMass_m: shifted(1.5),
    sauter_m: shifted(2.5),
    numberMean_m: shifted(0.5),
  };
}

const Z_LIMIT = 9;
const PANELS = 4096;

// Composite Simpson over z = ln(d/MMAD)/ln σg of E(d)·φ(z); ±9σ leaves under 1e-18 of the mass out.
export function conventionMassFraction(massMedianAerodynamic_m: number, gsd: number, convention: SamplingConvention): number {
  requirePositive('massMedianAerodynamic_m', massMedianAerodynamic_m);
  requireAtLeast('gsd', gsd, 1);
  const fraction = conventionFraction(convention);
  if (gsd === 1) return fraction(massMedianAerodynamic_m);
  const lnGsd = log(gsd);
  const h = (2 * Z_LIMIT) / PANELS;
  let sum = 0;
  for (let i = 0; i <= PANELS; i++) {
    const z = -Z_LIMIT + i * h;
    const weight = i === 0 || i === PANELS ? 1 : i % 2 === 1 ? 4 : 2;
    sum += weight * fraction(massMedianAerodynamic_m * exp(z * lnGsd)) * exp(-0.5 * z * z);
  }
  return (sum * h) / 3 / Math.sqrt(2 * Math.PI);
}
