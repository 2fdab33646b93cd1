import { decimalOrNaN } from '../../../../shared/format/parse-decimal';
import { lazy, Suspense, useMemo, useState } from 'react';
import { particleCalculatorSchema } from '../../../../shared/schemas/calculators';
import { Spinner } from '@/components/ui/status';
import { fieldErrors } from '@/lib/form-errors';
import { crossoverDiameter } from '@/features/calculators/lib/crossover';
import { displayDiameter, plainNumber } from '@/features/calculators/lib/format';
import { mediumFor, particleProperties } from '@/features/calculators/lib/particle-properties';
import { CalculatorLayout } from './calculator-layout';
import { DecadeTableView } from './decade-table-view';
import { PARTICLE_DEFAULTS, ParticleForm, type ParticleFormState } from './particle-form';
import { ParticleResults } from './particle-results';

// visx and the 121-point sweep are only needed once there is something valid to draw.
const ParticleChart = lazy(() => import('./particle-chart'));

export function ParticleCalculatorPage() {
  const [form, setForm] = useState<ParticleFormState>(PARTICLE_DEFAULTS);
  const parsed = useMemo(
    () =>
      particleCalculatorSchema.safeParse({
        ...form,
        diameter: decimalOrNaN(form.diameter),
        density_kgPerM3: decimalOrNaN(form.density_kgPerM3),
        shapeFactor: decimalOrNaN(form.shapeFactor),
        temperature_C: decimalOrNaN(form.temperature_C),
        pressure_kPa: decimalOrNaN(form.pressure_kPa),
        window_s: decimalOrNaN(form.window_s),
      }),
    [form],
  );
  const results = useMemo(() => {
    if (!parsed.success) return null;
    const medium = mediumFor(parsed.data);
    return { medium, particle: particleProperties(parsed.data.diameter_m, medium), crossover_m: crossoverDiameter(medium) };
  }, [parsed]);

  return (
    <CalculatorLayout
      title="Particle calculator"
      intro="How one particle size settles, diffuses and deposits in air, and which health-related fractions it counts towards. Results update as you type."
      formColumn="narrow"
      form={<ParticleForm form={form} errors={fieldErrors(parsed)} onChange={(patch) => setForm((f) => ({ ...f, ...patch }))} />}
      results={
        results ? (
          <>
            <ParticleResults p={results.particle} window_s={results.medium.window_s} />
            <p className="text-sm" data-testid="crossover">
              {results.crossover_m === null
                ? `Between 1 nm and 100 µm, one motion dominates throughout over ${plainNumber(results.medium.window_s)} s.`
                : `Over ${plainNumber(results.medium.window_s)} s, particles smaller than ${displayDiameter(results.crossover_m)} wander farther by Brownian motion than they settle; larger ones settle farther.`}
            </p>
            <Suspense fallback={<Spinner label="Drawing the chart…" />}>
              <ParticleChart medium={results.medium} crossover_m={results.crossover_m} diameter_m={results.particle.diameter_m} />
            </Suspense>
          </>
        ) : null
      }
      wide={results ? <DecadeTableView medium={results.medium} /> : null}
    />
  );
}
