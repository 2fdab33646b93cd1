import { describe, expect, it } from 'vitest';
import { leftOutSentence } from './left-out';

const range = { lowerPhysical_m: 1e-9, upperAerodynamic_m: 100e-6 };

describe('the left-out sentence', () => {
  it('names the share and the side when it is not negligible', () => {
    expect(leftOutSentence({ share: 0.03, below: 0.03, above: 0, ...range })).toBe(
      '3.0 % of the emitted mass is below 1 nm and is not simulated; the concentrations and fates shown cover the rest.',
    );
    expect(leftOutSentence({ share: 0.1587, below: 0, above: 0.1587, ...range })).toMatch(
      /^16 % of the emitted mass is above 100 µm aerodynamic diameter and is not simulated/,
    );
  });

  it('names both sides when both count', () => {
    expect(leftOutSentence({ share: 0.0455, below: 0.02275, above: 0.02275, ...range })).toMatch(
      /^2\.3 % of the emitted mass is below 1 nm and 2\.3 % above 100 µm aerodynamic diameter; neither is simulated/,
    );
  });

  it('says nothing for a negligible share or a result that predates it', () => {
    expect(leftOutSentence({ share: 0.00018, below: 0, above: 0.00018, ...range })).toBeNull();
    expect(leftOutSentence(undefined)).toBeNull();
  });
});
