import { BENCH_DIRECTION } from '../../../../shared/schemas/scenario';
import { HOOD_KIND_LABEL, HOOD_KINDS, isBenchKind } from '../../../../shared/vocabulary/index';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { hoodAngles, type HoodInput } from '@/features/scenario-editor/lib/hood-axis';
import { isSlot } from '@/features/scenario-editor/lib/hood-hints';
import { bindNumberFields } from '@/lib/bind-fields';
import { SHOWN_IN } from '@/features/scenario-editor/lib/shown-units';
import { DirectionFields } from './direction-fields';
import { NumberField } from './number-field';
import { FieldGrid } from './section';

const KINDS = HOOD_KINDS.map((value) => ({ value, label: HOOD_KIND_LABEL[value] }));

type Props = {
  hood: HoodInput;
  index: number;
  onChange: (patch: Partial<HoodInput>) => void;
  onRemove: () => void;
  errors: Record<string, string>;
};

export function HoodFields({ hood, index, onChange, onRemove, errors }: Props) {
  const at = (field: string) => errors[`hoods.${index}.${field}`];
  const field = bindNumberFields(hood, onChange, errors, `hoods.${index}`);
  const slot = isSlot(hood.kind);
  // A bench's face is its work surface: the schema always makes it face up, so the form says so and asks for its size.
  const bench = isBenchKind(hood.kind);
  const kindPatch = (kind: HoodInput['kind']): Partial<HoodInput> =>
    isBenchKind(kind) ? { kind, direction: { ...BENCH_DIRECTION } } : { kind };

  return (
    <div className="flex flex-col gap-4">
      <div className="flex items-center justify-between gap-3">
        <h3 className="font-semibold">Hood {index + 1}</h3>
        <Button variant="ghost" onClick={onRemove} aria-label={`Remove hood ${index + 1}`}>
          Remove
        </Button>
      </div>
      <FieldGrid>
        <SelectField
          label="Kind"
          value={hood.kind}
          onChange={(e) => onChange(kindPatch(e.target.value as HoodInput['kind']))}
          error={at('kind')}
        >
          {KINDS.map((k) => (
            <option key={k.value} value={k.value}>
              {k.label}
            </option>
          ))}
        </SelectField>
        <NumberField label={bench ? 'Work surface centre x' : 'Face centre x'} unit="m" {...field('x_m')} />
        <NumberField label={bench ? 'Work surface centre y' : 'Face centre y'} unit="m" {...field('y_m')} />
        <NumberField label={bench ? 'Work surface height' : 'Face centre height'} unit="m" {...field('z_m')} />
        {bench ? (
          <TextField label="Faces" value="Up" readOnly hint="A downdraft bench's work surface always faces up" error={at('direction')} />
        ) : (
          <DirectionFields
            angles={hoodAngles(hood.direction)}
            onDirection={(direction) => onChange({ direction })}
            errors={errors}
            path={`hoods.${index}`}
            labels={{ toward: 'Faces toward', tilt: 'Tilt' }}
            tiltHint="−90° faces the floor"
          />
        )}
        <NumberField
          label={bench ? 'Work surface length' : slot ? 'Slot length' : 'Face width'}
          {...SHOWN_IN.millimetres}
          {...field('faceWidth_m')}
          hint={bench ? 'Along x' : 'Across, horizontal'}
        />
        <NumberField
          label={bench ? 'Work surface depth' : slot ? 'Slot width' : 'Face height'}
          {...SHOWN_IN.millimetres}
          {...field('faceHeight_m')}
          hint={bench ? 'Along y' : undefined}
        />
        <NumberField label="Airflow" {...SHOWN_IN.cubicMetresPerHour} {...field('airflow_m3PerS')} />
      </FieldGrid>
    </div>
  );
}
