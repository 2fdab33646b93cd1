import { formatSig } from '../../../../shared/format/index';
import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { metresToMicrometres, micrometresToMetres } from '../../../../shared/units';
import { SelectField } from '@/components/ui/field';
import { IdSelectField } from '@/components/ui/id-select-field';
import { withDust } from '@/features/scenario-editor/lib/update';
import { bindNumberFields } from '@/lib/bind-fields';
import { SHOWN_IN } from '@/features/scenario-editor/lib/shown-units';
import { NumberField } from './number-field';
import { FieldGrid, type SectionProps } from './section';

type Profile = ScenarioInput['dust']['sizeProfile'];
export type SizeProfileOption = { id: number; name: string; sizeProfile: Profile };
type Props = SectionProps<ScenarioInput> & {
  sizeProfiles: SizeProfileOption[];
  sizeProfileId: number | null;
  onSizeProfileChange: (id: number | null) => void;
};

const INLINE: Profile = { kind: 'lognormal', basis: 'mmad', median_m: micrometresToMetres(5), gsd: 2 };

function describeProfile(p: Profile): string {
  if (p.kind === 'lognormal')
    return `Lognormal, ${p.basis.toUpperCase()} ${formatSig(metresToMicrometres(p.median_m), 3)} µm, GSD ${formatSig(p.gsd, 3)}`;
  const edges = p.edges_m.map(metresToMicrometres);
  return `${p.amounts.length} ${p.basis} bins from ${formatSig(edges[0], 2)} to ${formatSig(edges[edges.length - 1], 3)} µm`;
}

export function SizeProfileFields({ value, onChange, errors, sizeProfiles, sizeProfileId, onSizeProfileChange }: Props) {
  const profile = value.dust.sizeProfile;
  const setProfile = (next: Profile) => onChange(withDust(value, { sizeProfile: next }));
  const profileField = <P extends Profile>(p: P) => bindNumberFields(p, setProfile, errors, 'dust.sizeProfile');

  const choose = (id: number | null) => {
    onSizeProfileChange(id);
    const stored = sizeProfiles.find((p) => p.id === id);
    // Going back to the inline form keeps a lognormal already there; a stored bin profile cannot be edited inline.
    if (stored) setProfile(stored.sizeProfile);
    else if (profile.kind !== 'lognormal') setProfile(INLINE);
  };

  return (
    <div className="flex flex-col gap-4">
      <FieldGrid>
        <IdSelectField
          label="Size profile"
          className="sm:col-span-2"
          options={sizeProfiles}
          none="Enter lognormal here"
          value={sizeProfileId}
          onChange={choose}
        />
        {sizeProfileId === null && profile.kind === 'lognormal' && (
          <>
            <SelectField
              label="Median of"
              value={profile.basis}
              onChange={(e) => setProfile({ ...profile, basis: e.target.value as 'mmad' | 'cmd' })}
            >
              <option value="mmad">Mass (MMAD)</option>
              <option value="cmd">Count (CMD)</option>
            </SelectField>
            <NumberField
              label={profile.basis === 'mmad' ? 'MMAD' : 'CMD'}
              {...SHOWN_IN.micrometres}
              {...profileField(profile)('median_m')}
            />
            <NumberField label="GSD" {...profileField(profile)('gsd')} hint="1 is a single size" />
          </>
        )}
      </FieldGrid>
      {sizeProfileId !== null && <p className="text-sm text-muted">{describeProfile(profile)}</p>}
      {Object.entries(errors)
        .filter(([path]) => path.startsWith('dust.sizeProfile.') && !/median_m|gsd/.test(path))
        .map(([path, message]) => (
          <p key={path} role="alert" className="text-xs font-semibold text-act">
            Size profile: {message}
          </p>
        ))}
    </div>
  );
}
