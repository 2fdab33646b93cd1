import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { SelectField } from '@/components/ui/field';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import { withSource } from '@/features/scenario-editor/lib/update';
import { bindNumberFields } from '@/lib/bind-fields';
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
  const sourceField = bindNumberFields(source, (next) => onChange(withSource(value, next)), errors, 'source');
  // Bound after narrowing, so each kind offers only its own keys.
  const emissionField = <E extends Emission>(e: E) => bindNumberFields(e, setEmission, errors, 'source.emission');

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
        <NumberField label="Emission rate" unit="mg/min" {...emissionField(emission)('rate_mgPerMin')} />
      ) : (
        <>
          <NumberField label="Mass per burst" unit="mg" {...emissionField(emission)('massPerEvent_mg')} />
          <NumberField label="Bursts" unit="per h" {...emissionField(emission)('eventsPerHour')} />
        </>
      )}
      <NumberField label="Task duration" unit="min" {...emissionField(emission)('taskDuration_min')} hint="The simulated stretch" />
      <NumberField
        label="Task time per shift"
        unit="min"
        optional
        {...sourceField('taskMinutesPerShift')}
        placeholder={String(Math.min(480, emission.taskDuration_min))}
        hint="Blank: the task duration; at most 480"
      />
      <NumberField label="Background, rest of shift" unit="mg/m³" {...sourceField('background_mgPerM3', DEFAULTS.background_mgPerM3)} />
    </FieldGrid>
  );
}
