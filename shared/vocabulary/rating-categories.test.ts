import { describe, expect, it } from 'vitest';
import { exposureRatingCategory } from '../physics/exposure';
import { RATING_LABEL } from './rating-categories';

// Bands [S] AIHA Strategy, 4th ed.; edges from memory (shared physics notes §10).
describe('exposure rating category words', () => {
  it('names each category by where its band lies against the limit', () => {
    expect(RATING_LABEL[exposureRatingCategory(0.005)].band).toBe('below 1 % of the limit');
    expect(RATING_LABEL[exposureRatingCategory(0.3)]).toEqual({ name: 'Under half the limit', band: '10–50 % of the limit' });
    expect(RATING_LABEL[exposureRatingCategory(0.8)].name).toBe('Near the limit');
    expect(RATING_LABEL[exposureRatingCategory(1.5)].name).toBe('Over the limit');
  });

  it('uses a different short name for every category', () => {
    const names = Object.values(RATING_LABEL).map((r) => r.name);
    expect(new Set(names).size).toBe(5);
  });
});
