import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { TextField } from '@/components/ui/field';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import { withRun } from '@/features/scenario-editor/lib/update';
import { NumberField } from './number-field';
import { FieldGrid, Section, type SectionProps } from './section';

// A seed typed as digits is stored as a number so it matches seeds written by scripts.
const readSeed = (text: string): string | number => (/^-?\d{1,15}$/.test(text.trim()) ? Number(text.trim()) : text);

export function RunSection({ value, onChange, errors }: SectionProps<ScenarioInput>) {
  const run = value.run ?? {};
  const set = (patch: Partial<NonNullable<ScenarioInput['run']>>) => onChange(withRun(value, patch));

  return (
    <Section legend="Run settings" intro="More particles narrow the confidence band; the same seed gives the same result.">
      <FieldGrid>
        <NumberField
          label="Particles"
          value={run.particles ?? DEFAULTS.particles}
          onValue={(v) => set({ particles: v })}
          error={errors['run.particles']}
        />
        <TextField
          label="Seed"
          value={String(run.seed ?? DEFAULTS.seed)}
          onChange={(e) => set({ seed: readSeed(e.target.value) })}
          error={errors['run.seed']}
          autoComplete="off"
        />
        <NumberField
          label="Batches"
          value={run.batches ?? DEFAULTS.batches}
          onValue={(v) => set({ batches: v })}
          error={errors['run.batches']}
          hint="2 to 1000; they give the error bars"
        />
      </FieldGrid>
    </Section>
  );
}
