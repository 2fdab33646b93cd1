import { ENGINE_VERSION } from '../../workers/engine/version';

export const REVIEW_REASONS = {
  expired: 'the review date has passed',
  outOfDate: 'the scenario changed after the approved run',
  engineChanged: 'the engine has changed since this approval',
} as const;

const major = (version: string): number | null => {
  const m = /^(\d+)\./.exec(version.trim());
  return m ? Number(m[1]) : null;
};

// A new major engine version changes results for the same inputs; an approval resting on an older one is
// re-examined. A version that cannot be read counts as older (the cautious reading).
export function engineChangedSince(runEngineVersion: string | null | undefined, currentEngineVersion: string = ENGINE_VERSION): boolean {
  const run = major(runEngineVersion ?? '');
  const current = major(currentEngineVersion);
  if (current === null) throw new RangeError(`currentEngineVersion must look like 2.0.0, got ${currentEngineVersion}`);
  return run === null || run < current;
}

export function approvalReview(
  a: { expired: boolean; outOfDate: boolean; runEngineVersion: string | null },
  currentEngineVersion: string = ENGINE_VERSION,
) {
  const engineChanged = engineChangedSince(a.runEngineVersion, currentEngineVersion);
  const reasons = (['expired', 'outOfDate', 'engineChanged'] as const)
    .filter((k) => (k === 'engineChanged' ? engineChanged : a[k]))
    .map((k) => REVIEW_REASONS[k]);
  return { engineChanged, needsReview: reasons.length > 0, reviewReason: reasons.length ? reasons.join('; ') : null };
}
