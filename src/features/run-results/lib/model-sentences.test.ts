import { describe, expect, it } from 'vitest';
import { modelSentences } from './model-sentences';

const model = {
  roomDiffusivity_m2PerS: 0.013,
  roomDiffusivityRange_m2PerS: [0.001, 0.013] as [number, number],
  roomDiffusivityBasis:
    '(0.52·ACH + 8.61e-5 s⁻¹)·V^(2/3) gives 0.0446 m²/s, lowered to the ceiling of the 0.001–0.013 m²/s measured in rooms',
  lagrangianTime_s: 1.3,
  jet: { speed_mPerS: 5, diameter_m: 0.05, direction: [0, 0, 1] as [number, number, number], fromDefault: true },
  wallDeposition: true,
  frictionVelocity_mPerS: 0.01,
};

describe('modelSentences', () => {
  it('says the turbulence used and why, the jet and the surfaces in words', () => {
    const [turbulence, , jet, surfaces] = modelSentences(model);
    expect(turbulence).toMatch(/0\.0130 m²\/s\. The estimate .*gives 0\.0446 m²\/s, lowered to the ceiling/);
    expect(jet).toBe('Release jet: 5 m/s from a 5 cm stream, straight up, the release type’s default aimed at the breathing zone.');
    expect(surfaces).toMatch(/Lai & Nazaroff/);
  });

  it('names a horizontal jet by its plan angle and says when nothing is modelled', () => {
    const [, , jet, surfaces] = modelSentences({
      ...model,
      jet: { ...model.jet, direction: [0, 1, 0], fromDefault: false },
      wallDeposition: false,
    });
    expect(jet).toMatch(/at 90° in plan, 0° up, as entered/);
    expect(surfaces).toMatch(/only the floor collects/);
    expect(modelSentences({ ...model, jet: null })[2]).toMatch(/none/);
    expect(modelSentences(undefined)[0]).toMatch(/predates engine 2\.0/);
  });
});
