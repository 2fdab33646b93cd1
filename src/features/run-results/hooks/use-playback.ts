import { useCallback, useEffect, useRef, useState } from 'react';
import { advanceFrames } from '@/features/run-results/lib/trajectory-frames';

/** Frame clock on requestAnimationFrame; stops at the last frame and whenever the view unmounts. */
export function usePlayback(frames: number, frameInterval_s: number) {
  const [frame, setFrame] = useState(0);
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState(1);
  const position = useRef(0);

  useEffect(() => {
    if (!playing) return;
    let last = performance.now();
    let handle = requestAnimationFrame(function tick(now) {
      position.current = Math.min(frames - 1, position.current + advanceFrames(frameInterval_s, now - last, speed));
      last = now;
      setFrame(Math.floor(position.current));
      if (position.current >= frames - 1) setPlaying(false);
      else handle = requestAnimationFrame(tick);
    });
    return () => cancelAnimationFrame(handle);
  }, [playing, speed, frames, frameInterval_s]);

  const seek = useCallback((f: number) => {
    position.current = f;
    setFrame(f);
  }, []);

  const toggle = useCallback(() => {
    // Play from the end starts over; anything else resumes where the scrubber is.
    if (!playing && position.current >= frames - 1) seek(0);
    setPlaying((p) => !p);
  }, [playing, frames, seek]);

  return { frame, playing, speed, setSpeed, seek, toggle };
}
