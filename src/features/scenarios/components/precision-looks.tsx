import { percentText, readableNumber } from '../../../../shared/format/index';
import type { LookOutcome } from '../../../../workers/run-to-precision';

/** The looks of a run to a precision so far: each one's interval, so the engineer sees it narrow. */
export function PrecisionLooks({ looks, target, aim }: { looks: LookOutcome[]; target: number; aim: number }) {
  return (
    <div className="mt-2 text-sm" data-testid="precision-looks">
      <p className="text-muted">
        Filling batches {looks.length > 0 ? looks[looks.length - 1].look.batches + 1 : 1}–{target}; the run stops at ±
        {percentText(100 * aim)} or a decided verdict, looking only at 20, 40, 80, … batches.
      </p>
      {looks.length > 0 && (
        <ol className="mt-1 space-y-0.5 tabular-nums">
          {looks.map(({ look, relativeHalfWidth }) => (
            <li key={look.batches}>
              {look.batches} batches: {readableNumber(look.mean_mgPerM3)} mg/m³ ({readableNumber(look.ci_mgPerM3[0])}–
              {readableNumber(look.ci_mgPerM3[1])}), ±{Number.isFinite(relativeHalfWidth) ? percentText(100 * relativeHalfWidth, 2) : '∞'}
              {look.decided ? ', verdict decided' : ''}
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
