import { captureVelocityRange, type ReleaseCondition } from '../../../../shared/physics/index';
import {
  CALCULATOR_HOOD_KINDS,
  RELEASE_CONDITIONS,
  type AirflowUnit,
  type CalculatorHoodKind,
} from '../../../../shared/schemas/calculators';
import { HOOD_KIND_LABEL, isSlotKind, RELEASE_TYPE_LABEL } from '../../../../shared/vocabulary/index';
import { SelectField, TextField } from '@/components/ui/field';

export type HoodFormState = {
  kind: CalculatorHoodKind;
  width_m: string;
  height_m: string;
  basis: 'airflow' | 'capture';
  airflow: string;
  airflowUnit: AirflowUnit;
  captureVelocity_mPerS: string;
  distance_m: string;
  release: ReleaseCondition;
};

export const HOOD_DEFAULTS: HoodFormState = {
  kind: 'flanged',
  width_m: '0.4',
  height_m: '0.3',
  basis: 'airflow',
  airflow: '1800',
  airflowUnit: 'm3PerH',
  captureVelocity_mPerS: '1',
  distance_m: '0.25',
  release: 'low',
};

const numeric = { type: 'text', inputMode: 'decimal', autoComplete: 'off', spellCheck: false } as const;

export function HoodForm({
  form,
  errors,
  onChange,
}: {
  form: HoodFormState;
  errors: Record<string, string>;
  onChange: (patch: Partial<HoodFormState>) => void;
}) {
  const slot = isSlotKind(form.kind);
  return (
    <form
      aria-label="Hood and airflow"
      onSubmit={(e) => e.preventDefault()}
      className="grid gap-4 rounded-lg border border-line bg-white p-4 md:grid-cols-2 lg:grid-cols-1"
    >
      <SelectField
        label="Hood kind"
        value={form.kind}
        onChange={(e) => onChange({ kind: e.target.value as CalculatorHoodKind })}
        hint="Openings, slots and booths. A downdraft bench is not worked here: it is checked by its face velocity over the work surface, which a scenario's hood hints show."
      >
        {CALCULATOR_HOOD_KINDS.map((k) => (
          <option key={k} value={k}>
            {HOOD_KIND_LABEL[k]}
          </option>
        ))}
      </SelectField>
      <div className="grid grid-cols-2 gap-2">
        <TextField
          label="Face width"
          unit="m"
          {...numeric}
          value={form.width_m}
          error={errors.width_m}
          onChange={(e) => onChange({ width_m: e.target.value })}
        />
        <TextField
          label="Face height"
          unit="m"
          {...numeric}
          value={form.height_m}
          error={errors.height_m}
          onChange={(e) => onChange({ height_m: e.target.value })}
        />
        {slot && <p className="col-span-2 text-xs text-muted">The slot length is the longer side.</p>}
      </div>
      <fieldset className="md:col-span-2 lg:col-span-1">
        <legend className="text-sm font-semibold">Start from</legend>
        <div className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm">
          <label className="inline-flex items-center gap-2">
            <input type="radio" name="basis" checked={form.basis === 'airflow'} onChange={() => onChange({ basis: 'airflow' })} />
            the airflow
          </label>
          <label className="inline-flex items-center gap-2">
            <input type="radio" name="basis" checked={form.basis === 'capture'} onChange={() => onChange({ basis: 'capture' })} />a capture
            velocity to reach
          </label>
        </div>
      </fieldset>
      {form.basis === 'airflow' ? (
        <div className="grid grid-cols-[1fr_6.5rem] items-start gap-2">
          <TextField
            label="Airflow"
            {...numeric}
            value={form.airflow}
            error={errors.airflow}
            onChange={(e) => onChange({ airflow: e.target.value })}
          />
          <SelectField label="Unit" value={form.airflowUnit} onChange={(e) => onChange({ airflowUnit: e.target.value as AirflowUnit })}>
            <option value="m3PerH">m³/h</option>
            <option value="m3PerS">m³/s</option>
          </SelectField>
        </div>
      ) : (
        <TextField
          label="Capture velocity to reach"
          unit="m/s"
          {...numeric}
          value={form.captureVelocity_mPerS}
          error={errors.captureVelocity_mPerS}
          onChange={(e) => onChange({ captureVelocity_mPerS: e.target.value })}
        />
      )}
      <TextField
        label="Distance from the face"
        unit="m"
        {...numeric}
        value={form.distance_m}
        error={errors.distance_m}
        hint="Along the hood's centre line, to where the dust is released."
        onChange={(e) => onChange({ distance_m: e.target.value })}
      />
      <fieldset className="md:col-span-2 lg:col-span-1">
        <legend className="text-sm font-semibold">How the dust is released</legend>
        <div className="mt-1 grid gap-1.5 md:grid-cols-2 lg:grid-cols-1">
          {RELEASE_CONDITIONS.map((r) => {
            const range = captureVelocityRange(r);
            return (
              <label
                key={r}
                className={`flex gap-2 rounded-md border p-2 text-sm ${form.release === r ? 'border-accent bg-accent-soft' : 'border-line'}`}
              >
                <input
                  type="radio"
                  name="release"
                  className="mt-1"
                  checked={form.release === r}
                  onChange={() => onChange({ release: r })}
                />
                <span>
                  <span className="font-semibold">{RELEASE_TYPE_LABEL[r].word}</span> · {range.min_mPerS}–{range.max_mPerS} m/s
                  <span className="block text-xs text-muted">
                    {range.description}; e.g. {range.examples.join(', ')}
                  </span>
                </span>
              </label>
            );
          })}
        </div>
      </fieldset>
    </form>
  );
}
