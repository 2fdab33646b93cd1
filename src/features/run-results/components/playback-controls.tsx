import { useId } from 'react';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';

export const SPEEDS = [0.5, 1, 2, 4] as const;
const SPEED_CHOICE = { look: 'box', legend: 'Playback speed', caption: 'Speed', options: SPEEDS, label: (s: number) => `${s}×` } as const;

export function PlaybackControls({
  frame,
  frames,
  time_s,
  end_s,
  playing,
  speed,
  onToggle,
  onSeek,
  onSpeed,
}: {
  frame: number;
  frames: number;
  time_s: number;
  end_s: number;
  playing: boolean;
  speed: number;
  onToggle: () => void;
  onSeek: (frame: number) => void;
  onSpeed: (speed: number) => void;
}) {
  const id = useId();
  return (
    <div className="no-print flex flex-wrap items-center gap-x-5 gap-y-3 rounded-lg border border-line bg-white p-3 text-sm">
      <Button onClick={onToggle} aria-pressed={playing} className="w-28">
        <span aria-hidden="true">{playing ? '❚❚' : '▶'}</span>
        {playing ? 'Pause' : 'Play'}
      </Button>
      <div className="flex min-w-56 flex-1 items-center gap-3">
        <label htmlFor={`${id}-scrub`} className="font-semibold">
          Frame
        </label>
        <input
          id={`${id}-scrub`}
          type="range"
          min={0}
          max={Math.max(0, frames - 1)}
          step={1}
          value={frame}
          onChange={(e) => onSeek(Number(e.target.value))}
          aria-valuetext={`${time_s.toFixed(0)} s of ${end_s.toFixed(0)} s`}
          className="flex-1 accent-[var(--color-accent)]"
          data-testid="scrubber"
        />
        <output htmlFor={`${id}-scrub`} className="w-28 text-right tabular-nums" data-testid="frame-time" aria-live="off">
          t = {time_s.toFixed(0)} s / {end_s.toFixed(0)} s
        </output>
      </div>
      <ChoiceChips {...SPEED_CHOICE} value={speed} onChange={onSpeed} />
    </div>
  );
}
