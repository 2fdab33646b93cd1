export const RELEASE_TYPES = ['quiet', 'low', 'active', 'high'] as const;
export type ReleaseType = (typeof RELEASE_TYPES)[number];

/** `word` for tight lists, `description` where the air conditions must be read. */
export const RELEASE_TYPE_LABEL: Record<ReleaseType, { word: string; description: string }> = {
  quiet: { word: 'Quiet', description: 'Practically no velocity, quiet air' },
  low: { word: 'Low', description: 'Low velocity, moderately still air' },
  active: { word: 'Active', description: 'Active generation, rapid air motion' },
  high: { word: 'High', description: 'High initial velocity (grinding, blasting)' },
};
