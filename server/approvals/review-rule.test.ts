import { describe, expect, it } from 'vitest';
import { approvalReview, engineChangedSince } from './review-rule';

// Semantic versioning (semver.org, rule 8): only a major version change may change results incompatibly.
describe('engine version review rule', () => {
  it('marks an approval resting on a 1.x run for review once 2.0.0 runs', () => {
    expect(engineChangedSince('1.3.0', '2.0.0')).toBe(true);
    expect(approvalReview({ expired: false, outOfDate: false, runEngineVersion: '1.3.0' }, '2.0.0')).toEqual({
      engineChanged: true,
      needsReview: true,
      reviewReason: 'the engine has changed since this approval',
    });
  });

  it('leaves minor and patch changes alone, and a run from the running engine', () => {
    expect(engineChangedSince('2.0.0', '2.1.4')).toBe(false);
    expect(engineChangedSince('1.3.0', '1.3.0')).toBe(false);
    expect(approvalReview({ expired: false, outOfDate: false, runEngineVersion: '2.0.0' }, '2.0.0')).toEqual({
      engineChanged: false,
      needsReview: false,
      reviewReason: null,
    });
  });

  it('reads a version it cannot parse as older, and names every reason', () => {
    expect(engineChangedSince('', '2.0.0')).toBe(true);
    expect(approvalReview({ expired: true, outOfDate: true, runEngineVersion: '1.0.0' }, '2.0.0').reviewReason).toBe(
      'the review date has passed; the scenario changed after the approved run; the engine has changed since this approval',
    );
  });

  it('refuses a current version that is not a version', () => {
    expect(() => engineChangedSince('1.3.0', 'latest')).toThrow(/got latest/);
  });
});
