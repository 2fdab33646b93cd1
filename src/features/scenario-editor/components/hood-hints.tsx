import { metres } from '@/features/scenario-editor/lib/format';
import { formatSig } from '../../../../shared/format/index';
import type { ReleaseCondition } from '../../../../shared/physics/index';
import { cubicMetresPerSecondToPerHour } from '../../../../shared/units';
import type { HoodInput } from '@/features/scenario-editor/lib/hood-axis';
import { benchHint, hoodHint, type CaptureVerdict, type HoodHint } from '@/features/scenario-editor/lib/hood-hints';
import { BENCH_REACH_ABOVE_m } from '../../../../shared/physics/bench-face-velocity';
import { isBenchKind } from '../../../../shared/vocabulary/index';

type Point = { x_m: number; y_m: number; z_m: number };

const VERDICT: Record<CaptureVerdict, { icon: string; words: string; tone: string }> = {
  below: { icon: '▼', words: 'Below', tone: 'border-act bg-act-soft text-act' },
  within: { icon: '✓', words: 'Within', tone: 'border-clear bg-clear-soft text-clear' },
  above: { icon: '▲', words: 'Above', tone: 'border-watch bg-watch-soft text-watch' },
};

const mps = (v: number) => `${formatSig(v, 2)} m/s`;

function Warning({ children }: { children: string }) {
  return (
    <li className="flex gap-2 text-watch">
      <span aria-hidden="true">⚠</span>
      <span>{children}</span>
    </li>
  );
}

function warnings(h: HoodHint): string[] {
  const out: string[] = [];
  if (h.behind)
    out.push('The source is behind the face, so the centre-line equation says nothing about it. Turn the hood toward the source.');
  if (h.beyondValidity && h.rule === 'slot')
    out.push(
      `The source is ${metres(h.axial_m)} out; one slot is usually counted on to about ${metres(h.validUpTo_m)} (common practice). Expect less than this figure.`,
    );
  if (h.beyondValidity && h.rule === 'diameters')
    out.push(
      `The source is ${metres(h.axial_m)} out, past 1.5 equivalent diameters (${metres(h.validUpTo_m)}), where the equation stops holding. Expect less than this figure.`,
    );
  if (h.farOffAxis) out.push('The source is well off the hood axis; the air there moves slower than the centre-line figure.');
  return out;
}

export function HoodHints({
  hood,
  index,
  source,
  releaseType,
}: {
  hood: HoodInput;
  index: number;
  source: Point;
  releaseType: ReleaseCondition | undefined;
}) {
  if (isBenchKind(hood.kind)) return <BenchHints hood={hood} index={index} source={source} />;
  const h = hoodHint(hood, source, releaseType);
  if (!h) return <p className="text-sm text-muted">Hints appear once the face size and airflow are valid.</p>;
  const range = h.range ? `${formatSig(h.range.min_mPerS, 2)}–${formatSig(h.range.max_mPerS, 2)} m/s` : '';
  const verdict = h.verdict && VERDICT[h.verdict];
  const notes = warnings(h);

  return (
    <div className="flex flex-col gap-3 rounded-md bg-paper p-4 text-sm" data-testid={`hood-hints-${index}`} aria-live="polite">
      <p>
        Source {metres(Math.abs(h.axial_m))} {h.behind ? 'behind' : 'in front of'} the face along its axis, {metres(h.offAxis_m)} off the
        axis.
      </p>
      {h.centerline_mPerS !== null && verdict && (
        <p className={`flex items-start gap-2 rounded-md border px-3 py-2 ${verdict.tone}`} data-testid={`hood-verdict-${index}`}>
          <span aria-hidden="true">{verdict.icon}</span>
          <span>
            <strong className="font-semibold">≈ {mps(h.centerline_mPerS)} at the source</strong>
            {h.rule === 'booth' ? ' (a booth: the face velocity)' : ' on the centre line'}. {verdict.words} the {range} capture range for
            this release.
          </span>
        </p>
      )}
      {h.centerline_mPerS !== null && !h.range && (
        <p data-testid={`hood-verdict-${index}`}>
          ≈ {mps(h.centerline_mPerS)} at the source on the centre line. Say how the dust is released (under Source and emission) to compare
          it with a capture range.
        </p>
      )}
      {h.verdict === 'below' && h.range && h.airflowForRange_m3PerS !== null && (
        <p>
          About {formatSig(cubicMetresPerSecondToPerHour(h.airflowForRange_m3PerS), 2)} m³/h would reach {formatSig(h.range.min_mPerS, 2)}{' '}
          m/s at the source, or move the hood closer.
        </p>
      )}
      <p className="text-muted">Face velocity {mps(h.faceVelocity_mPerS)} (airflow ÷ face area).</p>
      {notes.length > 0 && (
        <ul className="flex flex-col gap-1">
          {notes.map((n) => (
            <Warning key={n}>{n}</Warning>
          ))}
        </ul>
      )}
    </div>
  );
}

// A downdraft bench is read by its face velocity over the work surface, whatever the release type.
function BenchHints({ hood, index, source }: { hood: HoodInput; index: number; source: Point }) {
  const h = benchHint(hood, source);
  if (!h) return <p className="text-sm text-muted">Hints appear once the work surface size and airflow are valid.</p>;
  const range = `${formatSig(h.range.min_mPerS, 2)}–${formatSig(h.range.max_mPerS, 2)} m/s`;
  const verdict = h.verdict && VERDICT[h.verdict];
  const where =
    h.height_m >= 0
      ? `Source ${metres(h.height_m)} above the work surface, ${metres(h.offCentre_m)} from its centre in plan.`
      : `Source ${metres(-h.height_m)} below the work surface, ${metres(h.offCentre_m)} from its centre in plan.`;
  return (
    <div className="flex flex-col gap-3 rounded-md bg-paper p-4 text-sm" data-testid={`hood-hints-${index}`} aria-live="polite">
      <p>{where}</p>
      {verdict ? (
        <p className={`flex items-start gap-2 rounded-md border px-3 py-2 ${verdict.tone}`} data-testid={`hood-verdict-${index}`}>
          <span aria-hidden="true">{verdict.icon}</span>
          <span>
            <strong className="font-semibold">≈ {mps(h.faceVelocity_mPerS)} over the work surface</strong> (airflow ÷ surface area).{' '}
            {verdict.words} the {range} downdraft benches need (common practice: confirm against local guidance).
          </span>
        </p>
      ) : (
        <ul className="flex flex-col gap-1" data-testid={`hood-verdict-${index}`}>
          <Warning>
            {`The source is not over the work surface (inside its outline, at most ${metres(BENCH_REACH_ABOVE_m)} above it), so the face-velocity guidance does not apply and the check counts no speed. Move the source over the bench or the bench under it.`}
          </Warning>
        </ul>
      )}
      {h.verdict === 'below' && (
        <p>
          About {formatSig(cubicMetresPerSecondToPerHour(h.airflowForRange_m3PerS), 2)} m³/h would bring the face velocity to{' '}
          {formatSig(h.range.min_mPerS, 2)} m/s.
        </p>
      )}
      {!verdict && <p className="text-muted">Face velocity {mps(h.faceVelocity_mPerS)} (airflow ÷ work surface area).</p>}
    </div>
  );
}
