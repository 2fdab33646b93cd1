import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { DAY_TO_DAY_GSD_SOURCE, DEFAULT_DAY_TO_DAY_GSD } from '../../../../shared/verdict/day-to-day';
import { SelectField } from '@/components/ui/field';
import { DEFAULTS, POSTURE_HEIGHT_m } from '@/features/scenario-editor/lib/defaults';
import { withWorker } from '@/features/scenario-editor/lib/update';
import { bindNumberFields } from '@/lib/bind-fields';
import { NumberField } from './number-field';
import { FieldGrid, Section, type SectionProps } from './section';

type Posture = keyof typeof POSTURE_HEIGHT_m;

export function WorkerSection({ value, onChange, errors }: SectionProps<ScenarioInput>) {
  const worker = value.worker;
  const set = (patch: Partial<ScenarioInput['worker']>) => onChange(withWorker(value, patch));
  const field = bindNumberFields(worker, set, errors, 'worker');
  // Choosing a posture moves the nose to its usual height; typing a height keeps the posture as a label.
  const choosePosture = (posture: Posture | '') =>
    set(posture === '' ? { posture: undefined } : { posture, z_m: POSTURE_HEIGHT_m[posture] });

  return (
    <Section legend="Worker and breathing zone" intro="The breathing zone is a sphere around the nose and mouth.">
      <FieldGrid>
        <SelectField label="Posture" value={worker.posture ?? ''} onChange={(e) => choosePosture(e.target.value as Posture | '')}>
          <option value="standing">Standing (1.5 m)</option>
          <option value="seated">Seated (1.1 m)</option>
          <option value="">Other height</option>
        </SelectField>
        <NumberField label="Nose and mouth x" unit="m" {...field('x_m')} />
        <NumberField label="Nose and mouth y" unit="m" {...field('y_m')} />
        <NumberField label="Nose and mouth height" unit="m" {...field('z_m')} />
        <NumberField label="Breathing-zone radius" unit="m" {...field('radius_m', DEFAULTS.radius_m)} hint="Usually 0.3 m" />
        <NumberField
          label="Day-to-day GSD"
          optional
          value={worker.dayToDayGsd}
          onValue={(dayToDayGsd) => set({ dayToDayGsd })}
          error={errors['worker.dayToDayGsd']}
          placeholder={String(DEFAULT_DAY_TO_DAY_GSD)}
          hint={
            <span data-testid="gsd-source">
              How much this worker's 8-h exposures vary from day to day; the verdict judges their 95th percentile. Blank:{' '}
              {DEFAULT_DAY_TO_DAY_GSD} ({DAY_TO_DAY_GSD_SOURCE}).
            </span>
          }
        />
      </FieldGrid>
    </Section>
  );
}
