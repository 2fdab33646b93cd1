import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { TextField } from '@/components/ui/field';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import { withRun } from '@/features/scenario-editor/lib/update';
import { bindNumberFields } from '@/lib/bind-fields';
import { NumberField } from './number-field';
import { FieldGrid, Section, type SectionProps } from './section';

// A seed typed as digits is stored as a number so it matches seeds written by scripts.
const readSeed = (text: string): string | number => (/^-?\d{1,15}$/.test(text.trim()) ? Number(text.trim()) : text);

export function RunSection({ value, onChange, errors }: SectionProps<ScenarioInput>) {
  const run = value.run ?? {};
  const set = (patch: Partial<NonNullable<ScenarioInput['run']>>) => onChange(withRun(value, patch));
  const field = bindNumberFields(run, set, errors, 'run');

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
      </FieldGrid>
    </Section>
  );
}
