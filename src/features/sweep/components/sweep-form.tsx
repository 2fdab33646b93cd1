import { countText, trimSig } from '../../../../shared/format/index';
import { decimalOrNaN } from '../../../../shared/format/parse-decimal';
import { useMemo, useState, type FormEvent } from 'react';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { HOOD_KIND_LABEL } from '../../../../shared/vocabulary/index';
import { faceText, PARAMETER } from '@/features/sweep/lib/parameter-format';
import {
  buildSweepPoints,
  distanceRange_m,
  MAX_POINTS,
  MIN_POINTS,
  sourceDistance_m,
  type SweepParameter,
  type SweepPoint,
  type SweepSpec,
} from '@/features/sweep/lib/sweep-points';

export interface SweepRequest {
  spec: SweepSpec;
  points: SweepPoint[];
  targetFraction: number;
  particles: number;
}

type Draft = { hoodIndex: number; parameter: SweepParameter; from: string; to: string; count: string; target: string; particles: string };

const round = (v: number, digits = 3) => trimSig(v, digits);

// Defaults bracket the current setting by a factor of two each way, so the current design sits mid-range.
function defaultRange(scenario: Scenario, hoodIndex: number, parameter: SweepParameter): [string, string] {
  const hood = scenario.hoods[hoodIndex];
  if (parameter === 'airflow')
    return [round(PARAMETER.airflow.fromSi(hood.airflow_m3PerS / 2)), round(PARAMETER.airflow.fromSi(hood.airflow_m3PerS * 2))];
  if (parameter === 'faceScale') return ['0.5', '2'];
  const d = sourceDistance_m(scenario, hoodIndex);
  const [lo, hi] = distanceRange_m(scenario, hoodIndex);
  return [round(Math.max(lo, d / 2), 2), round(Math.min(hi, Math.max(d * 2, 0.1)), 2)];
}

export function SweepForm({
  scenario,
  disabled,
  onStart,
}: {
  scenario: Scenario;
  disabled: boolean;
  onStart: (request: SweepRequest) => void;
}) {
  const [draft, setDraft] = useState<Draft>(() => {
    const [from, to] = defaultRange(scenario, 0, 'distance');
    return { hoodIndex: 0, parameter: 'distance', from, to, count: '5', target: '0.5', particles: String(scenario.run.particles) };
  });
  const set = (change: Partial<Draft>) => setDraft((d) => ({ ...d, ...change }));
  const choose = (hoodIndex: number, parameter: SweepParameter) => {
    const [from, to] = defaultRange(scenario, hoodIndex, parameter);
    set({ hoodIndex, parameter, from, to });
  };

  const checked = useMemo(() => {
    const p = PARAMETER[draft.parameter];
    const targetFraction = decimalOrNaN(draft.target);
    const particles = decimalOrNaN(draft.particles);
    if (!(targetFraction > 0 && targetFraction <= 10))
      return { error: `Enter the target as a fraction of the limit above 0 (0.5 is half the limit), got “${draft.target}”.` };
    if (!(Number.isInteger(particles) && particles >= 100))
      return { error: `Particles per point must be a whole number of at least 100, got “${draft.particles}”.` };
    const base = { ...scenario, run: { ...scenario.run, particles } };
    const spec: SweepSpec = {
      hoodIndex: draft.hoodIndex,
      parameter: draft.parameter,
      from: p.toSi(decimalOrNaN(draft.from)),
      to: p.toSi(decimalOrNaN(draft.to)),
      count: decimalOrNaN(draft.count),
    };
    try {
      return { request: { spec, points: buildSweepPoints(base, spec), targetFraction, particles } };
    } catch (error) {
      return { error: (error as Error).message };
    }
  }, [draft, scenario]);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (checked.request) onStart(checked.request);
  };
  const hood = scenario.hoods[draft.hoodIndex];
  const unit = PARAMETER[draft.parameter].unit;
  const [lo, hi] = distanceRange_m(scenario, draft.hoodIndex);

  return (
    <form
      aria-label="Sweep settings"
      onSubmit={submit}
      className="grid gap-4 rounded-lg border border-line bg-white p-4 sm:grid-cols-2 lg:grid-cols-4"
    >
      {scenario.hoods.length > 1 && (
        <SelectField label="Hood" value={draft.hoodIndex} onChange={(e) => choose(Number(e.target.value), draft.parameter)}>
          {scenario.hoods.map((h, i) => (
            <option key={i} value={i}>{`${i + 1}. ${h.name ?? HOOD_KIND_LABEL[h.kind]}`}</option>
          ))}
        </SelectField>
      )}
      <SelectField
        label="Parameter"
        value={draft.parameter}
        onChange={(e) => choose(draft.hoodIndex, e.target.value as SweepParameter)}
        className="sm:col-span-2"
      >
        {(Object.keys(PARAMETER) as SweepParameter[]).map((k) => (
          <option key={k} value={k}>
            {PARAMETER[k].label}
          </option>
        ))}
      </SelectField>
      <TextField label="From" unit={unit} inputMode="decimal" value={draft.from} onChange={(e) => set({ from: e.target.value })} />
      <TextField label="To" unit={unit} inputMode="decimal" value={draft.to} onChange={(e) => set({ to: e.target.value })} />
      <TextField
        label="Number of points"
        type="number"
        min={MIN_POINTS}
        max={MAX_POINTS}
        value={draft.count}
        onChange={(e) => set({ count: e.target.value })}
        hint={`${MIN_POINTS} to ${MAX_POINTS}`}
      />
      <TextField
        label="Target"
        unit="× limit"
        inputMode="decimal"
        value={draft.target}
        onChange={(e) => set({ target: e.target.value })}
        hint="Upper 95 % bound of the 8-h TWA must stay at or below this; 0.5 is half the limit."
      />
      <TextField
        label="Particles per point"
        type="number"
        min={100}
        step={100}
        value={draft.particles}
        onChange={(e) => set({ particles: e.target.value })}
        hint="Fewer particles run faster but widen every interval."
      />
      <p className="text-sm text-muted sm:col-span-2 lg:col-span-4">
        {HOOD_KIND_LABEL[hood.kind]}: {faceText(hood)} face, {countText(PARAMETER.airflow.fromSi(hood.airflow_m3PerS))} m³/h,{' '}
        {round(sourceDistance_m(scenario, draft.hoodIndex))} m from the source along its axis.
        {draft.parameter === 'distance' &&
          ` The face slides along its axis and must stay inside the room: ${round(lo, 2)} to ${round(hi, 2)} m.`}{' '}
        Every point uses the scenario's seed ({String(scenario.run.seed)}), so the differences between points are not blurred by different
        random draws.
      </p>
      {checked.error && (
        <p role="alert" className="text-sm font-semibold text-act sm:col-span-2 lg:col-span-4">
          {checked.error}
        </p>
      )}
      <div className="sm:col-span-2 lg:col-span-4">
        <Button type="submit" disabled={disabled || !checked.request}>
          ▶ Run the sweep{checked.request ? ` (${checked.request.points.length} points)` : ''}
        </Button>
      </div>
    </form>
  );
}
