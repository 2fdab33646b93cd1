import { useId } from 'react';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';

export const SPEEDS = [0.5, 1, 2, 4] as const;
const SPEED_CHOICE = { look: 'box', legend: 'Playback speed', caption: 'Speed', options: SPEEDS, label: (s: number) => `${s}×` } as const;

const clock = (t_s: number) => `${Math.round(t_s)} s`;

export function PlaybackControls({
  time_s,
  end_s,
  step_s,
  playing,
  speed,
  onToggle,
  onSeek,
  onSpeed,
}: {
  time_s: number;
  end_s: number;
  /** One recorded frame: what an arrow key on the scrubber moves. */
  step_s: number;
  playing: boolean;
  speed: number;
  onToggle: () => void;
  onSeek: (time_s: number) => void;
  onSpeed: (speed: number) => void;
}) {
  const id = useId();
  return (
    <div className="no-print flex flex-wrap items-center gap-x-5 gap-y-3 rounded-lg border border-line bg-white p-3 text-sm">
      <Button onClick={onToggle} aria-pressed={playing} className="w-28">
        <span aria-hidden="true">{playing ? '❚❚' : '▶'}</span>
        {playing ? 'Pause' : 'Play'}
      </Button>
      <div className="flex min-w-0 flex-[1_1_14rem] items-center gap-3">
        <label htmlFor={`${id}-scrub`} className="font-semibold">
          Time
        </label>
        <input
          id={`${id}-scrub`}
          type="range"
          min={0}
          max={end_s}
          step={step_s}
          value={time_s}
          onChange={(e) => onSeek(Number(e.target.value))}
          aria-valuetext={`${clock(time_s)} of ${clock(end_s)}`}
          className="min-w-0 flex-1 accent-[var(--color-accent)]"
          data-testid="scrubber"
        />
        <output htmlFor={`${id}-scrub`} className="w-32 shrink-0 text-right tabular-nums" data-testid="frame-time" aria-live="off">
          t = {clock(time_s)} / {clock(end_s)}
        </output>
      </div>
      <ChoiceChips {...SPEED_CHOICE} value={speed} onChange={onSpeed} />
    </div>
  );
}
