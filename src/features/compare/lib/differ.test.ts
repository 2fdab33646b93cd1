import { describe, expect, it } from 'vitest';
import { normalQuantile } from '../../../../shared/physics/index';
import { compareMeans, standardError, Z_CRITICAL } from './differ';

const estimate = (mean: number, se: number) => ({ mean, ci95: [mean - Z_CRITICAL * se, mean + Z_CRITICAL * se] as [number, number] });

describe('telling two Monte-Carlo means apart', () => {
  it('uses the standard normal 97.5 % quantile as the two-sided 5 % critical value', () => {
    expect(Z_CRITICAL).toBeCloseTo(normalQuantile(0.975), 2);
  });

  it('reads the standard error back from a symmetric 95 % interval', () => {
    expect(standardError(estimate(2, 0.1))).toBeCloseTo(0.1, 12);
  });

  it('takes the wider side when the lower bound was clipped at the background', () => {
    expect(standardError({ mean: 1, ci95: [0.99, 1.196] })).toBeCloseTo(0.1, 12);
  });

  it('finds two equal means within statistical error', () => {
    const d = compareMeans(estimate(1, 0.1), estimate(1, 0.1));
    expect(d).toMatchObject({ difference: 0, z: 0, differs: false, statement: 'within statistical error (z = 0.0)' });
  });

  it('finds means 10 standard errors apart different', () => {
    // Each SE is 0.1/√2, so the SE of the difference is 0.1 and a gap of 1 is z = 10.
    const se = 0.1 / Math.SQRT2;
    const d = compareMeans(estimate(5, se), estimate(6, se));
    expect(d.z).toBeCloseTo(10, 10);
    expect(d.differs).toBe(true);
    expect(d.statement).toBe('differs (z = 10.0)');
    expect(d.differencePercent).toBeCloseTo(20, 10);
  });

  it('keeps a gap just under the critical value within statistical error', () => {
    const d = compareMeans(estimate(0, 1 / Math.SQRT2), estimate(1.9, 1 / Math.SQRT2));
    expect(d.differs).toBe(false);
    expect(d.statement).toBe('within statistical error (z = 1.9)');
  });

  it('states the size of z without its sign and leaves the direction to the difference', () => {
    const d = compareMeans(estimate(10, 0.1), estimate(1, 0.1));
    expect(d.difference).toBe(-9);
    expect(d.statement).toBe(`differs (z = ${(9 / Math.hypot(0.1, 0.1)).toFixed(1)})`);
  });

  it('does not judge a difference when either interval has no width, and gives no percentage against zero', () => {
    // A zero-width interval is too few zone histories, not an exact figure: its error is not known (shared/format NO_WIDTH_TEXT).
    const d = compareMeans({ mean: 0, ci95: [0, 0] }, { mean: 1, ci95: [1, 1] });
    expect(d).toMatchObject({ differs: false, statement: 'not judged: an interval is not known' });
    expect(d.z).toBeNaN();
    expect(d.differencePercent).toBeNaN();
    // One side with no width is enough: the other's error alone would understate the difference's.
    const one = compareMeans({ mean: 0.015, ci95: [0.015, 0.015] }, estimate(0.4, 0.01));
    expect(one).toMatchObject({ differs: false, statement: 'not judged: an interval is not known' });
    expect(one.difference).toBeCloseTo(0.385, 12);
    expect(one.z).toBeNaN();
  });
});
