export const RELEASE_TYPES = ['quiet', 'low', 'active', 'high'] as const;
export type ReleaseType = (typeof RELEASE_TYPES)[number];

/** `word` for tight lists, `description` where the air conditions must be read, `phrase` inside a sentence ("the range for …"). */
export const RELEASE_TYPE_LABEL: Record<ReleaseType, { word: string; description: string; phrase: string }> = {
  quiet: { word: 'Quiet', description: 'Practically no velocity, quiet air', phrase: 'release into quiet air' },
  low: { word: 'Low', description: 'Low velocity, moderately still air', phrase: 'low-velocity release' },
  active: { word: 'Active', description: 'Active generation, rapid air motion', phrase: 'active generation' },
  high: { word: 'High', description: 'High initial velocity (grinding, blasting)', phrase: 'high-velocity release' },
};
