import { Button } from '@/components/ui/button';
import { ProgressBar, timeLeft } from '@/components/progress-bar';
import type { SweepProgress as Progress } from '@/features/sweep/hooks/use-sweep-run';

export function SweepProgress({ progress, onCancel }: { progress: Progress; onCancel: () => void }) {
  const pct = Math.round(progress.fraction * 100);
  return (
    <section aria-label="Sweep progress" className="rounded-lg border border-line bg-white p-4">
      <ProgressBar label="Sweep progress" percent={pct} />
      <div className="mt-2 flex flex-wrap items-center gap-3">
        <p className="text-sm text-muted" aria-live="polite">
          {pct} % · {progress.pointsDone} of {progress.points} points done · about {timeLeft(progress.secondsLeft)} left
        </p>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </section>
  );
}
