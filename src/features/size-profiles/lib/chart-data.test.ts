import { describe, expect, it } from 'vitest';
import { fittedCumulative, fittedPerDecade } from './chart-data';

const at = (curve: { d_um: number; value: number }[], d_um: number) =>
  curve.reduce((best, p) => (Math.abs(Math.log(p.d_um / d_um)) < Math.abs(Math.log(best.d_um / d_um)) ? p : best)).value;

describe('the fitted lognormal drawn over the data', () => {
  // MMAD 10 µm, GSD 2; Φ(0) = 0.5 and Φ(1) = 0.8413 from the standard normal table.
  const cumulative = fittedCumulative(10e-6, 2, 0.1, 1000, 401);
  it('holds half the mass below the MMAD and 84.13 % below MMAD × GSD', () => {
    expect(at(cumulative, 10)).toBeCloseTo(0.5, 2);
    expect(at(cumulative, 20)).toBeCloseTo(0.8413, 2);
  });

  it('has a mass per decade that adds up to the whole mass and peaks at the MMAD', () => {
    const perDecade = fittedPerDecade(10e-6, 2, 0.01, 10_000, 2001);
    let total = 0;
    for (let i = 1; i < perDecade.length; i++)
      total += 0.5 * (perDecade[i].value + perDecade[i - 1].value) * Math.log10(perDecade[i].d_um / perDecade[i - 1].d_um);
    expect(total).toBeCloseTo(1, 4);
    const peak = perDecade.reduce((a, b) => (b.value > a.value ? b : a));
    expect(peak.d_um).toBeCloseTo(10, 0);
  });
});
