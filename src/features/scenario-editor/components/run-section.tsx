import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { countText } from '../../../../shared/format/index';
import { SelectField, TextField } from '@/components/ui/field';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import { withRun } from '@/features/scenario-editor/lib/update';
import { bindNumberFields } from '@/lib/bind-fields';
import { FIRST_LOOK_BATCHES, PRECISION_BATCH_PARTICLES } from '../../../../workers/run-to-precision';
import { NumberField } from './number-field';
import { FieldGrid, Section, type SectionProps } from './section';

// A seed typed as digits is stored as a number so it matches seeds written by scripts.
const readSeed = (text: string): string | number => (/^-?\d{1,15}$/.test(text.trim()) ? Number(text.trim()) : text);

export function RunSection({ value, onChange, errors }: SectionProps<ScenarioInput>) {
  const run = value.run ?? {};
  const set = (patch: Partial<NonNullable<ScenarioInput['run']>>) => onChange(withRun(value, patch));
  const field = bindNumberFields(run, set, errors, 'run');
  const precision = run.precision ? { relativeHalfWidth: 0.1, maxBatches: 640, ...run.precision } : undefined;
  const perBatch = Math.ceil((run.particles ?? DEFAULTS.particles) / (run.batches ?? DEFAULTS.batches));

  return (
    <Section legend="Run settings" intro="More particles narrow the confidence band; the same seed gives the same result.">
      <FieldGrid>
        <NumberField label="Particles" {...field('particles', DEFAULTS.particles)} />
        <TextField
          label="Seed"
          value={String(run.seed ?? DEFAULTS.seed)}
          onChange={(e) => set({ seed: readSeed(e.target.value) })}
          error={errors['run.seed']}
          autoComplete="off"
        />
        <NumberField label="Batches" {...field('batches', DEFAULTS.batches)} hint="2 to 1000; they give the error bars" />
        <SelectField
          label="Run until"
          value={precision ? 'precision' : 'particles'}
          onChange={(e) =>
            set(
              e.target.value === 'precision'
                ? // Small batches let the first look come early; the looks' spent error rate keeps their intervals honest.
                  {
                    precision: { relativeHalfWidth: 0.1, maxBatches: 640 },
                    batches: FIRST_LOOK_BATCHES,
                    particles: FIRST_LOOK_BATCHES * PRECISION_BATCH_PARTICLES,
                  }
                : { precision: undefined },
            )
          }
          hint={
            precision
              ? `Batches of ${countText(perBatch)} particles (particles ÷ batches), looked at only at 20, 40, 80, … batches; the particles above are the first look`
              : undefined
          }
        >
          <option value="particles">All the particles above</option>
          <option value="precision">A precision or a decision</option>
        </SelectField>
        {precision && (
          <>
            <NumberField
              label="Precision, ±"
              unit="%"
              value={precision.relativeHalfWidth}
              toDisplay={(v) => 100 * v}
              fromDisplay={(v) => v / 100}
              onValue={(relativeHalfWidth) => set({ precision: { ...precision, relativeHalfWidth } })}
              error={errors['run.precision.relativeHalfWidth']}
              hint="Half-width of the limit fraction's 8-h TWA interval, relative to the mean"
            />
            <NumberField
              label="At most"
              unit="batches"
              value={precision.maxBatches}
              onValue={(maxBatches) => set({ precision: { ...precision, maxBatches } })}
              error={errors['run.precision.maxBatches']}
              hint="20 to 2,560; the run stops there even when undecided"
            />
          </>
        )}
      </FieldGrid>
      <label className="inline-flex items-center gap-2 text-sm font-semibold">
        <input
          type="checkbox"
          className="h-4 w-4 accent-accent"
          checked={run.varianceReduction ?? true}
          onChange={(e) => set({ varianceReduction: e.target.checked })}
        />
        Variance reduction: split simulated dust near the breathing zone, thin it out at the hood face (untick for the plain walk: the same
        answer on average, a wider band)
      </label>
    </Section>
  );
}
