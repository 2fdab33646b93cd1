import { Button } from '@/components/ui/button';
import type { SweepProgress as Progress } from '@/features/sweep/hooks/use-sweep-run';

const secs = (s: number) => (Number.isFinite(s) ? (s < 60 ? `${Math.ceil(s)} s` : `${Math.ceil(s / 60)} min`) : '…');

export function SweepProgress({ progress, onCancel }: { progress: Progress; onCancel: () => void }) {
  const pct = Math.round(progress.fraction * 100);
  return (
    <section aria-label="Sweep progress" className="rounded-lg border border-line bg-white p-4">
      <div
        role="progressbar"
        aria-label="Sweep progress"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct}
        className="h-3 w-full overflow-hidden rounded-full bg-paper-deep"
      >
        <div className="h-full bg-accent transition-[width]" style={{ width: `${pct}%` }} />
      </div>
      <div className="mt-2 flex flex-wrap items-center gap-3">
        <p className="text-sm text-muted" aria-live="polite">
          {pct} % · {progress.pointsDone} of {progress.points} points done · about {secs(progress.secondsLeft)} left
        </p>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </section>
  );
}
