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

/**
 * The same, as the subject of "… needs 2.5–10 m/s": the type in the words of its description, not an example task,
 * which read oddly beside another one (a sanding bench's note spoke of "tipping a sack").
 */
export const RELEASE_TYPE_NEEDS: Record<ReleaseType, string> = {
  quiet: 'a quiet release (drifting off with almost no motion of its own)',
  low: 'a low-velocity release (leaving gently into fairly still air)',
  active: 'an active release (thrown out into briskly moving air)',
  high: 'a high-velocity release (flung out fast into very fast-moving air)',
};
