const ORDER = ['quiet', 'low', 'active', 'high'] as const;
type Release = (typeof ORDER)[number];

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const isRelease = (v: unknown): v is Release => typeof v === 'string' && (ORDER as readonly string[]).includes(v);

/** The most demanding release type among hoods that carried one (the cautious reading when they disagree). */
export function hoodsReleaseType(hoods: unknown): Release | undefined {
  if (!Array.isArray(hoods)) return undefined;
  const found = hoods.map((h) => (isRecord(h) ? h.releaseType : undefined)).filter(isRelease);
  return found.length ? found.reduce((a, b) => (ORDER.indexOf(b) > ORDER.indexOf(a) ? b : a)) : undefined;
}

// Before engine 2.0 a hood carried the release type; the release belongs to the source, so it moves there.
// A release type already on the source wins; anything that is not an old-shaped scenario passes untouched.
export function upgradeScenario(input: unknown): unknown {
  if (!isRecord(input) || !Array.isArray(input.hoods) || !isRecord(input.source)) return input;
  if (!input.hoods.some((h) => isRecord(h) && 'releaseType' in h)) return input;
  const fromHoods = hoodsReleaseType(input.hoods);
  const hoods = input.hoods.map((h) => {
    if (!isRecord(h)) return h;
    const { releaseType: _dropped, ...rest } = h;
    return rest;
  });
  const source = input.source.releaseType === undefined && fromHoods ? { ...input.source, releaseType: fromHoods } : input.source;
  return { ...input, source, hoods };
}
