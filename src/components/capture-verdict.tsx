import { captureCheck, type CaptureVerdictWord } from '../../shared/physics/capture-verdict';
import type { Scenario } from '../../shared/schemas/scenario';

const TONE: Record<CaptureVerdictWord, { icon: string; cls: string }> = {
  'below-half': { icon: '▼▼', cls: 'border-act bg-act-soft text-act' },
  below: { icon: '▼', cls: 'border-watch bg-watch-soft text-watch' },
  within: { icon: '✓', cls: 'border-clear bg-clear-soft text-clear' },
  above: { icon: '▲', cls: 'border-line bg-paper text-ink' },
};

/** The hand-calculated capture speed at the source against the release type's range (a bench's face velocity against its guidance), beside a result. */
export function CaptureVerdict({ scenario, compact = false }: { scenario: Pick<Scenario, 'source' | 'hoods'>; compact?: boolean }) {
  if (scenario.hoods.length === 0) return null;
  const check = captureCheck(scenario);
  if (!check) {
    return (
      <p className="text-sm text-muted" data-testid="capture-verdict">
        No release type is given for the source, so the hood is not compared with a capture-velocity range.
      </p>
    );
  }
  const tone = TONE[check.verdict];
  if (compact) return <span data-testid="capture-verdict">{check.sentence}</span>;
  return (
    <p className={`flex items-start gap-2 rounded-md border px-3 py-2 text-sm ${tone.cls}`} data-testid="capture-verdict">
      <span aria-hidden="true">{tone.icon}</span>
      <span>
        <strong className="font-semibold">{check.sentence}</strong>{' '}
        {check.basis === 'face-velocity'
          ? 'Face velocity: airflow ÷ work surface area. The range is common practice, not a published figure.'
          : "Hand calculation on the hood's centre line (Dalla Valle / ACGIH); the capture ranges are from the ACGIH capture-velocity table."}
      </span>
    </p>
  );
}
