import { readableNumber } from '../../../../shared/format/index';
import { cubicMetresPerSecondToPerHour } from '../../../../shared/units';
import type { HoodFigures } from '@/features/calculators/lib/hood-figures';
import { TRANSPORT_VELOCITY_mPerS } from '@/features/calculators/lib/hood-figures';
import { plainNumber } from '@/features/calculators/lib/format';
import { HOOD_KIND_LABEL } from '../../../../shared/vocabulary/index';
import { ResultGrid, ResultItem } from './result-item';

const perHour = (airflow_m3PerS: number) => `${readableNumber(cubicMetresPerSecondToPerHour(airflow_m3PerS))} m³/h`;

const VERDICT = {
  below: { icon: '✕', text: 'below the published range for this release', tone: 'text-act' },
  within: { icon: '✓', text: 'within the published range for this release', tone: 'text-clear' },
  above: { icon: '✓', text: 'above the published range for this release', tone: 'text-clear' },
} as const;

export function HoodResultsPanel({ f, distance_m, basis }: { f: HoodFigures; distance_m: number; basis: 'airflow' | 'capture' }) {
  const verdict = VERDICT[f.verdict];
  const booth = f.geometry.kind === 'booth';
  return (
    <section aria-labelledby="hood-results" className="space-y-4">
      <h2 id="hood-results">
        {HOOD_KIND_LABEL[f.geometry.kind]}, {readableNumber(f.geometry.faceArea_m2)} m² face, {plainNumber(f.validUpTo_m / 1.5)} m
        equivalent diameter
      </h2>
      <ResultGrid label="Hood results">
        <ResultItem
          label={booth ? 'Velocity at the booth face' : `Centre-line velocity at ${plainNumber(distance_m)} m`}
          value={readableNumber(f.centerline_mPerS)}
          unit="m/s"
          testId="centerline-velocity"
          note={
            <span className={verdict.tone} data-testid="capture-verdict">
              <span aria-hidden="true">{verdict.icon} </span>
              {verdict.text}
            </span>
          }
        />
        <ResultItem
          label="Published capture velocity"
          value={`${f.range.min_mPerS}–${f.range.max_mPerS}`}
          unit="m/s"
          testId="capture-range"
          note={`${f.range.description}; e.g. ${f.range.examples.join(', ')}`}
        />
        <ResultItem
          label={basis === 'capture' ? 'Required airflow' : 'Airflow entered'}
          value={readableNumber(f.airflow_m3PerS)}
          unit="m³/s"
          testId="airflow"
          note={perHour(f.airflow_m3PerS)}
        />
        <ResultItem
          label={`Airflow for the published range at ${plainNumber(distance_m)} m`}
          value={`${readableNumber(f.requiredForRange_m3PerS.min)}–${readableNumber(f.requiredForRange_m3PerS.max)}`}
          unit="m³/s"
          testId="required-airflow"
          note={`${perHour(f.requiredForRange_m3PerS.min)} to ${perHour(f.requiredForRange_m3PerS.max)}`}
        />
        <ResultItem
          label="Face velocity"
          value={readableNumber(f.faceVelocity_mPerS)}
          unit="m/s"
          testId="face-velocity"
          note="Airflow divided by face area"
        />
        <ResultItem
          label="Duct diameter for this airflow"
          value={`${readableNumber(f.ductDiameter_m.min * 1000)}–${readableNumber(f.ductDiameter_m.max * 1000)}`}
          unit="mm"
          testId="duct-diameter"
          note={`Keeps transport velocity at ${TRANSPORT_VELOCITY_mPerS.min}–${TRANSPORT_VELOCITY_mPerS.max} m/s, the guidance for average industrial dust (ACGIH)`}
        />
      </ResultGrid>
      <ValidityNote f={f} distance_m={distance_m} />
    </section>
  );
}

function ValidityNote({ f, distance_m }: { f: HoodFigures; distance_m: number }) {
  if (f.geometry.kind === 'booth') {
    return (
      <p className="text-sm text-muted" data-testid="validity">
        A booth&apos;s capture velocity is its face velocity; the distance does not enter, and the figure says nothing about air in front of
        the face.
      </p>
    );
  }
  const limit = `${readableNumber(f.validUpTo_m)} m`;
  return (
    <div className="space-y-2 text-sm" data-testid="validity">
      <p className={f.beyondValidity ? 'font-semibold text-watch' : 'text-muted'}>
        {f.beyondValidity ? (
          <span aria-hidden="true">! </span>
        ) : (
          <span
            aria-hidden="true"
            className="mr-1 inline-flex h-4 w-4 items-center justify-center rounded-full border border-muted text-[10px] font-bold"
          >
            i
          </span>
        )}
        The centre-line equation holds to about 1.5 hood diameters (1.5·√(4A/π)), here {limit}.
        {f.beyondValidity &&
          ` ${plainNumber(distance_m)} m is beyond that: the real velocity there is likely lower, and off the centre line lower still.`}
      </p>
      {f.aspectMismatch && (
        <p className="font-semibold text-watch">
          <span aria-hidden="true">! </span>
          {f.geometry.kind.includes('slot')
            ? 'This face is wider than 0.2 of its length, so it is not a slot: the opening equations fit it better.'
            : 'This face is narrower than 0.2 of its length: the slot equations fit it better.'}
        </p>
      )}
    </div>
  );
}
