import {
  cubicMetresPerHourToPerSecond,
  cubicMetresPerSecondToPerHour,
  metresToMillimetres,
  millimetresToMetres,
} from '../../../../shared/units';
import { HOOD_KIND_LABEL, HOOD_KINDS } from '../../../../shared/vocabulary/index';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { hoodAngles, type HoodInput } from '@/features/scenario-editor/lib/hood-axis';
import { isSlot } from '@/features/scenario-editor/lib/hood-hints';
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
  const { azimuth_deg, tilt_deg } = hoodAngles(hood.direction);
  const directionError = at('direction') ?? at('direction.azimuth_deg');
  const slot = isSlot(hood.kind);
  const mm = { unit: 'mm', toDisplay: metresToMillimetres, fromDisplay: millimetresToMetres };

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
          onChange={(e) => onChange({ kind: e.target.value as HoodInput['kind'] })}
          error={at('kind')}
        >
          {KINDS.map((k) => (
            <option key={k.value} value={k.value}>
              {k.label}
            </option>
          ))}
        </SelectField>
        <NumberField label="Face centre x" unit="m" value={hood.x_m} onValue={(v) => onChange({ x_m: v })} error={at('x_m')} />
        <NumberField label="Face centre y" unit="m" value={hood.y_m} onValue={(v) => onChange({ y_m: v })} error={at('y_m')} />
        <NumberField label="Face centre height" unit="m" value={hood.z_m} onValue={(v) => onChange({ z_m: v })} error={at('z_m')} />
        <NumberField
          label="Faces toward"
          unit="° in plan"
          value={azimuth_deg}
          onValue={(v) => onChange({ direction: { azimuth_deg: v, elevation_deg: tilt_deg } })}
          error={directionError}
          hint="0° is +x, 90° is +y"
        />
        <NumberField
          label="Tilt"
          unit="°"
          value={tilt_deg}
          onValue={(v) => onChange({ direction: { azimuth_deg, elevation_deg: v } })}
          error={at('direction.elevation_deg')}
          hint="−90° faces the floor"
        />
        <NumberField
          label={slot ? 'Slot length' : 'Face width'}
          {...mm}
          value={hood.faceWidth_m}
          onValue={(v) => onChange({ faceWidth_m: v })}
          error={at('faceWidth_m')}
          hint="Across, horizontal"
        />
        <NumberField
          label={slot ? 'Slot width' : 'Face height'}
          {...mm}
          value={hood.faceHeight_m}
          onValue={(v) => onChange({ faceHeight_m: v })}
          error={at('faceHeight_m')}
        />
        <NumberField
          label="Airflow"
          unit="m³/h"
          value={hood.airflow_m3PerS}
          toDisplay={cubicMetresPerSecondToPerHour}
          fromDisplay={cubicMetresPerHourToPerSecond}
          onValue={(v) => onChange({ airflow_m3PerS: v })}
          error={at('airflow_m3PerS')}
        />
      </FieldGrid>
    </div>
  );
}
