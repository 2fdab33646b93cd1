// The engine check is a bare diagnostic page and keeps its thinner bar. Neither animates its width: with no GPU each
// animated frame is laid out and painted on the page's thread, which took about a third of a core from the workers
// during a run (Chromium's profiler, bakery flanged hood), and the bar moves four times a second anyway.
const LOOK = {
  regular: { track: 'h-3 w-full overflow-hidden rounded-full bg-paper-deep', fill: 'h-full bg-accent' },
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
