// The engine check is a bare diagnostic page and keeps its thinner bar without the width animation.
const LOOK = {
  regular: { track: 'h-3 w-full overflow-hidden rounded-full bg-paper-deep', fill: 'h-full bg-accent transition-[width]' },
  slim: { track: 'h-2 w-full overflow-hidden rounded bg-line', fill: 'h-full bg-accent' },
} as const;

export function ProgressBar({ label, percent, look = 'regular' }: { label: string; percent: number; look?: keyof typeof LOOK }) {
  return (
    <div role="progressbar" aria-label={label} aria-valuemin={0} aria-valuemax={100} aria-valuenow={percent} className={LOOK[look].track}>
      <div className={LOOK[look].fill} style={{ width: `${percent}%` }} />
    </div>
  );
}

// Seconds under a minute, whole minutes above; an estimate not yet known reads as an ellipsis.
export const timeLeft = (s: number) => (Number.isFinite(s) ? (s < 60 ? `${Math.ceil(s)} s` : `${Math.ceil(s / 60)} min`) : '…');
