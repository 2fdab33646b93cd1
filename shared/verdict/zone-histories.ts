/**
 * Histories that must reach the breathing zone before a batch interval is trusted: with ten
 * batches that is about 30 zone visitors per batch, where a batch mean is close enough to normal
 * for the t-interval (the n ≥ 30 rule of thumb, common practice).
 */
export const MIN_ZONE_HISTORIES = 300;

export interface HistoryCheck {
  reason: string | null;
  moreHistories: number | null;
}

// Two significant figures, rounded up: "about 12,000 more" should never fall short.
function roundUp(n: number): number {
  if (n <= 0) return 0;
  let step = 1;
  while (step * 100 <= n) step *= 10;
  return Math.ceil(n / step) * step;
}

const count = (n: number) => n.toLocaleString('en');

/** Whether enough independent histories reached the zone, and if not, how many more to run at the current rate. */
export function checkZoneHistories(zoneHistories: number | undefined, histories: number): HistoryCheck {
  if (zoneHistories === undefined || !Number.isFinite(zoneHistories)) {
    return {
      reason:
        'This result does not say how many simulated particles reached the breathing zone (it predates that count): run it again to decide.',
      moreHistories: null,
    };
  }
  if (zoneHistories <= 0) {
    return {
      reason: `No simulated dust reached the breathing zone in ${count(histories)} histories. The figure is only the background; judge whether the zone is really out of reach, or run many more particles.`,
      moreHistories: null,
    };
  }
  if (zoneHistories >= MIN_ZONE_HISTORIES) return { reason: null, moreHistories: 0 };
  const more = roundUp((MIN_ZONE_HISTORIES * histories) / zoneHistories - histories);
  return {
    reason: `Not enough particles reached the breathing zone to decide: ${count(zoneHistories)} of ${count(histories)}, and ${MIN_ZONE_HISTORIES} are needed. Run about ${count(more)} more particles.`,
    moreHistories: more,
  };
}
