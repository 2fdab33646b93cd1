import { captureVelocityRange, type ReleaseCondition } from '../../../../shared/physics/index';
import { defaultJet } from '../../../../shared/physics/release-jets';
import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { formatSig } from '../../../../shared/format/index';
import { metresToMillimetres } from '../../../../shared/units';
import { RELEASE_TYPE_LABEL, RELEASE_TYPES } from '../../../../shared/vocabulary/release-types';
import { SelectField } from '@/components/ui/field';
import { hoodAngles } from '@/features/scenario-editor/lib/hood-axis';
import { breathingZoneAngles, jetToEdit, withJet, withReleaseType, type JetInput } from '@/features/scenario-editor/lib/release-jet';
import { bindNumberFields } from '@/lib/bind-fields';
import { SHOWN_IN } from '@/features/scenario-editor/lib/shown-units';
import { DirectionFields } from './direction-fields';
import { NumberField } from './number-field';
import { FieldGrid, type SectionProps } from './section';

const range = (r: ReleaseCondition) => {
  const c = captureVelocityRange(r);
  return `${formatSig(c.min_mPerS, 2)}–${formatSig(c.max_mPerS, 2)} m/s`;
};

const toAngles = (a: { azimuth_deg: number; elevation_deg: number }) => ({ azimuth_deg: a.azimuth_deg, tilt_deg: a.elevation_deg });

function defaultText(release: ReleaseCondition | undefined): string {
  if (!release) return 'Choose how the dust is released to get its default jet.';
  const jet = defaultJet(release);
  if (!jet) return 'A quiet release throws no air of its own, so there is no default jet.';
  return `Default: ${formatSig(jet.speed_mPerS, 2)} m/s from a ${formatSig(metresToMillimetres(jet.diameter_m), 2)} mm stream, aimed at the breathing zone (the cautious choice). ${jet.reasoning} (common practice)`;
}

export function ReleaseFields({ value, onChange, errors }: SectionProps<ScenarioInput>) {
  const release = value.source.releaseType;
  const jet = value.source.jet;
  const setJet = (patch: Partial<JetInput>) => jet && onChange(withJet(value, { ...jet, ...patch }));
  // A jet written without a direction aims at the breathing zone; the fields show that aim.
  const angles = jet?.direction ? hoodAngles(jet.direction) : jet ? toAngles(breathingZoneAngles(value)) : null;
  const jetField = jet && bindNumberFields(jet, setJet, errors, 'source.jet');

  return (
    <div className="flex flex-col gap-4">
      <SelectField
        label="How the dust is released"
        value={release ?? ''}
        onChange={(e) => onChange(withReleaseType(value, (e.target.value || undefined) as ReleaseCondition | undefined))}
        error={errors['source.releaseType']}
      >
        {!release && <option value="">Not given</option>}
        {RELEASE_TYPES.map((r) => (
          <option key={r} value={r}>
            {RELEASE_TYPE_LABEL[r].description} (capture {range(r)})
          </option>
        ))}
      </SelectField>
      <div>
        <label className="flex items-center gap-2 text-sm font-semibold">
          <input
            type="checkbox"
            checked={!jet}
            onChange={(e) => onChange(withJet(value, e.target.checked ? undefined : jetToEdit(value)))}
          />{' '}
          Use the default jet for this release type
        </label>
        <p className="mt-1 text-xs text-muted" data-testid="jet-default">
          {defaultText(release)}
        </p>
      </div>
      {jetField && angles && (
        <FieldGrid>
          <NumberField label="Jet speed" unit="m/s" {...jetField('speed_mPerS')} hint="0 for no jet" />
          <NumberField label="Jet diameter" {...SHOWN_IN.millimetres} {...jetField('diameter_m')} />
          <DirectionFields
            angles={angles}
            onDirection={(direction) => setJet({ direction })}
            errors={errors}
            path="source.jet"
            labels={{ toward: 'Jet aims toward', tilt: 'Jet tilt' }}
            tiltHint="−90° blows at the floor"
          />
        </FieldGrid>
      )}
    </div>
  );
}
