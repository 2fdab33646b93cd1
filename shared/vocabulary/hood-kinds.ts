export const HOOD_KINDS = ['plain', 'flanged', 'slot', 'flanged-slot', 'booth', 'downdraft-bench'] as const;
export type HoodKind = (typeof HOOD_KINDS)[number];

export const HOOD_KIND_LABEL: Record<HoodKind, string> = {
  plain: 'Plain opening',
  flanged: 'Flanged opening',
  slot: 'Slot',
  'flanged-slot': 'Flanged slot',
  booth: 'Booth',
  'downdraft-bench': 'Downdraft bench',
};

export const isSlotKind = (kind: HoodKind): boolean => kind === 'slot' || kind === 'flanged-slot';

/** A downdraft bench's face is its working surface: it always faces up, and it is checked by its face velocity. */
export const isBenchKind = (kind: HoodKind): boolean => kind === 'downdraft-bench';

// Records written before a kind was renamed keep their stored word rather than a blank.
export const hoodKindLabel = (kind: string): string =>
  (HOOD_KINDS as readonly string[]).includes(kind) ? HOOD_KIND_LABEL[kind as HoodKind] : kind;
