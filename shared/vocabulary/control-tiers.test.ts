import { describe, expect, it } from 'vitest';
import { controlTierLabel, controlTierRank } from './control-tiers';

describe('control tiers', () => {
  // NIOSH, "Hierarchy of Controls" (most effective first): elimination, substitution, engineering, administrative, PPE.
  it('rank in the NIOSH hierarchy order, with no control and unknown tiers last', () => {
    const niosh = ['elimination', 'substitution', 'engineering', 'administrative', 'respiratory'];
    const ranks = niosh.map(controlTierRank);
    expect([...ranks].sort((a, b) => a - b)).toEqual(ranks);
    expect(controlTierRank('none')).toBeGreaterThan(controlTierRank('respiratory'));
    expect(controlTierRank('ventilation (old record)')).toBeGreaterThan(controlTierRank('none'));
  });
  it('name a tier in words and keep an unknown stored word as it is', () => {
    expect(controlTierLabel('engineering')).toBe('Engineering control');
    expect(controlTierLabel('ventilation (old record)')).toBe('ventilation (old record)');
  });
});
