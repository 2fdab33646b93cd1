import { describe, expect, it } from 'vitest';
import { aerodynamicDiameter } from '../physics/index';
import { counterToBins } from './counter';
import { plainBinsToBins } from './plain-bins';

describe('counter bins to mass bins', () => {
  it('weights each count by its geometric mid-diameter cubed (sphere mass, Hinds Eq. 3.x volume πd³/6)', () => {
    const bins = counterToBins(
      [
        { lower_m: 1e-6, upper_m: 4e-6, amount: 8 },
        { lower_m: 4e-6, upper_m: 16e-6, amount: 1 },
      ],
      2000,
    );
    // Mid-diameters 2 and 8 µm: masses 8·8 and 1·512, so shares 1/9 and 8/9.
    expect(bins.massFraction[0]).toBeCloseTo(1 / 9, 12);
    expect(bins.massFraction[1]).toBeCloseTo(8 / 9, 12);
  });

  it('turns the physical edges into aerodynamic ones with the given density (Hinds Eq. 3.26 form)', () => {
    const bins = counterToBins(
      [
        { lower_m: 1e-6, upper_m: 2e-6, amount: 1 },
        { lower_m: 2e-6, upper_m: 5e-6, amount: 1 },
      ],
      2650,
    );
    expect(bins.edges_m).toEqual([1e-6, 2e-6, 5e-6].map((d) => aerodynamicDiameter(d, 2650)));
    expect(bins.edges_m[2] / 5e-6).toBeCloseTo(Math.sqrt(2.65), 1);
  });

  it('fills a gap between rows with an empty bin (our format rule)', () => {
    const bins = plainBinsToBins([
      { lower_m: 1e-6, upper_m: 2e-6, amount: 0.5 },
      { lower_m: 3e-6, upper_m: 4e-6, amount: 0.5 },
    ]);
    expect(bins.edges_m).toEqual([1e-6, 2e-6, 3e-6, 4e-6]);
    expect(bins.massFraction).toEqual([0.5, 0, 0.5]);
  });
});
