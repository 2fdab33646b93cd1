import { useCallback, useEffect, useRef, useState } from 'react';
import { advanceTime_s } from '@/features/run-results/lib/trajectory-frames';

/** Simulated-time clock on requestAnimationFrame, paused at `start_s` at first; stops at the end and whenever the view unmounts. */
export function usePlayback(end_s: number, rate_sPerS: number, start_s = 0) {
  const [time_s, setTime] = useState(start_s);
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState(1);
  const position = useRef(start_s);

  useEffect(() => {
    if (!playing) return;
    let last = performance.now();
    let handle = requestAnimationFrame(function tick(now) {
      position.current = Math.min(end_s, position.current + advanceTime_s(rate_sPerS, now - last, speed));
      last = now;
      setTime(position.current);
      if (position.current >= end_s) setPlaying(false);
      else handle = requestAnimationFrame(tick);
    });
    return () => cancelAnimationFrame(handle);
  }, [playing, speed, end_s, rate_sPerS]);

  const seek = useCallback((t: number) => {
    position.current = t;
    setTime(t);
  }, []);

  const toggle = useCallback(() => {
    // Play from the end starts over; anything else resumes where the scrubber is.
    if (!playing && position.current >= end_s) seek(0);
    setPlaying((p) => !p);
  }, [playing, end_s, seek]);

  return { time_s, playing, speed, setSpeed, seek, toggle };
}
