import { trimSig } from '../../../../shared/format/index';
import { decimalOrNaN } from '../../../../shared/format/parse-decimal';
import { lazy, Suspense, useMemo, useState } from 'react';
import { airflowToPerSecond, hoodCalculatorSchema } from '../../../../shared/schemas/calculators';
import { cubicMetresPerSecondToPerHour } from '../../../../shared/units';
import { Spinner } from '@/components/ui/status';
import { fieldErrors } from '@/lib/form-errors';
import { hoodFigures } from '@/features/calculators/lib/hood-figures';
import { HOOD_DEFAULTS, HoodForm, type HoodFormState } from './hood-form';
import { HoodResultsPanel } from './hood-results-panel';
import { CalculatorLayout } from './calculator-layout';

const HoodChart = lazy(() => import('./hood-chart'));

function toInput(form: HoodFormState) {
  const common = {
    kind: form.kind,
    width_m: decimalOrNaN(form.width_m),
    height_m: decimalOrNaN(form.height_m),
    distance_m: decimalOrNaN(form.distance_m),
    release: form.release,
  };
  return form.basis === 'airflow'
    ? { ...common, basis: 'airflow' as const, airflow: decimalOrNaN(form.airflow), airflowUnit: form.airflowUnit }
    : { ...common, basis: 'capture' as const, captureVelocity_mPerS: decimalOrNaN(form.captureVelocity_mPerS) };
}

// Switching the airflow unit keeps the same physical airflow rather than reinterpreting the digits.
function withUnitChange(form: HoodFormState, patch: Partial<HoodFormState>): HoodFormState {
  const next = { ...form, ...patch };
  if (!patch.airflowUnit || patch.airflowUnit === form.airflowUnit) return next;
  const value = decimalOrNaN(form.airflow);
  if (!Number.isFinite(value)) return next;
  const perS = airflowToPerSecond(value, form.airflowUnit);
  const converted = patch.airflowUnit === 'm3PerH' ? cubicMetresPerSecondToPerHour(perS) : perS;
  return { ...next, airflow: trimSig(converted, 4) };
}

export function HoodCalculatorPage() {
  const [form, setForm] = useState<HoodFormState>(HOOD_DEFAULTS);
  const parsed = useMemo(() => hoodCalculatorSchema.safeParse(toInput(form)), [form]);
  const figures = useMemo(() => (parsed.success ? hoodFigures(parsed.data) : null), [parsed]);

  return (
    <CalculatorLayout
      title="Hood calculator"
      intro="Centre-line air velocity in front of a capturing hood, the airflow it needs for a capture velocity, and the duct to carry it. Results update as you type."
      formColumn="wide"
      form={<HoodForm form={form} errors={fieldErrors(parsed)} onChange={(patch) => setForm((f) => withUnitChange(f, patch))} />}
      results={
        figures && parsed.success ? (
          <>
            <HoodResultsPanel f={figures} distance_m={parsed.data.distance_m} basis={parsed.data.basis} />
            <Suspense fallback={<Spinner label="Drawing the chart…" />}>
              <HoodChart f={figures} distance_m={parsed.data.distance_m} />
            </Suspense>
          </>
        ) : null
      }
    />
  );
}
