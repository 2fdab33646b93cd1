import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { SelectField } from '@/components/ui/field';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import { withSource } from '@/features/scenario-editor/lib/update';
import { NumberField } from './number-field';
import { FieldGrid, type SectionProps } from './section';

type Emission = ScenarioInput['source']['emission'];

// Switching kind keeps the task duration, the one figure both kinds share.
function switchKind(emission: Emission, kind: Emission['kind']): Emission {
  if (kind === emission.kind) return emission;
  const { taskDuration_min } = emission;
  return kind === 'continuous'
    ? { kind, rate_mgPerMin: 5, taskDuration_min }
    : { kind, massPerEvent_mg: 20, eventsPerHour: 12, taskDuration_min };
}

export function EmissionFields({ value, onChange, errors }: SectionProps<ScenarioInput>) {
  const source = value.source;
  const emission = source.emission;
  const setEmission = (next: Emission) => onChange(withSource(value, { emission: next }));
  const at = (field: string) => errors[`source.emission.${field}`];

  return (
    <FieldGrid>
      <SelectField
        label="Emission"
        value={emission.kind}
        onChange={(e) => setEmission(switchKind(emission, e.target.value as Emission['kind']))}
      >
        <option value="continuous">Continuous</option>
        <option value="bursts">Bursts</option>
      </SelectField>
      {emission.kind === 'continuous' ? (
        <NumberField
          label="Emission rate"
          unit="mg/min"
          value={emission.rate_mgPerMin}
          onValue={(v) => setEmission({ ...emission, rate_mgPerMin: v })}
          error={at('rate_mgPerMin')}
        />
      ) : (
        <>
          <NumberField
            label="Mass per burst"
            unit="mg"
            value={emission.massPerEvent_mg}
            onValue={(v) => setEmission({ ...emission, massPerEvent_mg: v })}
            error={at('massPerEvent_mg')}
          />
          <NumberField
            label="Bursts"
            unit="per h"
            value={emission.eventsPerHour}
            onValue={(v) => setEmission({ ...emission, eventsPerHour: v })}
            error={at('eventsPerHour')}
          />
        </>
      )}
      <NumberField
        label="Task duration"
        unit="min"
        value={emission.taskDuration_min}
        onValue={(v) => setEmission({ ...emission, taskDuration_min: v })}
        error={at('taskDuration_min')}
        hint="The simulated stretch"
      />
      <NumberField
        label="Task time per shift"
        unit="min"
        optional
        value={source.taskMinutesPerShift}
        placeholder={String(Math.min(480, emission.taskDuration_min))}
        onValue={(v) => onChange(withSource(value, { taskMinutesPerShift: v }))}
        error={errors['source.taskMinutesPerShift']}
        hint="Blank: the task duration; at most 480"
      />
      <NumberField
        label="Background, rest of shift"
        unit="mg/m³"
        value={source.background_mgPerM3 ?? DEFAULTS.background_mgPerM3}
        onValue={(v) => onChange(withSource(value, { background_mgPerM3: v }))}
        error={errors['source.background_mgPerM3']}
      />
    </FieldGrid>
  );
}
