export const RELEASE_TYPES = ['quiet', 'low', 'active', 'high'] as const;
export type ReleaseType = (typeof RELEASE_TYPES)[number];

/**
 * `word` for tight lists, `description` (our own words) where the air conditions must be read, `phrase` inside a
 * sentence ("the range for …"). The speed ranges stay with the capture-velocity table.
 */
export const RELEASE_TYPE_LABEL: Record<ReleaseType, { word: string; description: string; phrase: string }> = {
  quiet: { word: 'Quiet', description: 'Quiet: drifts off with almost no motion of its own', phrase: 'release into quiet air' },
  low: { word: 'Low', description: 'Low: leaves gently into fairly still air', phrase: 'low-velocity release' },
  active: { word: 'Active', description: 'Active: thrown out into briskly moving air', phrase: 'active release' },
  high: { word: 'High', description: 'High: flung out fast into very fast-moving air', phrase: 'high-velocity release' },
};

/** The same, as the subject of "… needs 2.5–10 m/s". */
export const RELEASE_TYPE_NEEDS: Record<ReleaseType, string> = {
  quiet: 'a quiet release, such as vapour off an open tank,',
  low: 'a gentle release, such as pouring powder into a bin,',
  active: 'an active release, such as tipping a sack,',
  high: 'a high-energy release, such as grinding,',
};
