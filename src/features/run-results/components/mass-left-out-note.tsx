import type { RunResult } from '../../../../shared/schemas/run-result';
import { leftOutSentence } from '../lib/left-out';

/** One sentence when part of the emission lies outside the simulated sizes; nothing otherwise. */
export function MassLeftOutNote({ view }: { view: RunResult }) {
  const text = leftOutSentence(view.massLeftOut);
  if (!text) return null;
  return (
    <p role="note" className="mt-3 max-w-3xl text-sm" data-testid="mass-left-out">
      {text}
    </p>
  );
}
