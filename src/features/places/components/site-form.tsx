import { useState } from 'react';
import { siteInputSchema } from '../../../../shared/schemas/workspace';
import type { SiteRecord } from '../../../../shared/schemas/workspace-views';
import { TextField } from '@/components/ui/field';
import { VersionConflict } from '@/components/version-conflict';
import { useSchemaSubmit } from '@/hooks/use-schema-submit';
import { useCreateSite } from '@/features/places/api/create-place';
import { useUpdateSite } from '@/features/places/api/update-place';
import { usePlaceSave } from '@/features/places/lib/use-place-save';
import { FormEnd, formBox } from './place-form-parts';

const LABELS = { name: 'Site name', 'data.address': 'Address', 'data.notes': 'Notes' };

export function SiteForm({ site, onDone }: { site?: SiteRecord; onDone?: () => void }) {
  const [name, setName] = useState(site?.name ?? '');
  const [address, setAddress] = useState(site?.data.address ?? '');
  const save = usePlaceSave(site, useCreateSite(), useUpdateSite());
  const value = { name, data: { address, notes: site?.data.notes ?? '' } };
  const done = () => {
    if (!site) {
      setName('');
      setAddress('');
    }
    onDone?.();
  };
  const { errors, submit } = useSchemaSubmit(siteInputSchema, value, save.mutation, done);
  return (
    <form onSubmit={submit} noValidate aria-label={site ? `Edit site ${site.name}` : 'New site'} className={formBox}>
      <TextField label="Site name" value={name} onChange={(e) => setName(e.target.value)} error={errors.name} />
      <TextField label="Address" value={address} onChange={(e) => setAddress(e.target.value)} error={errors['data.address']} />
      <FormEnd noun="Site" mutation={save.outcome} editing={Boolean(site)} onCancel={site ? onDone : undefined} />
      {save.saved && (
        <div className="sm:col-span-3">
          <VersionConflict
            what="site"
            mine={value}
            saved={save.saved}
            savedFields={{ name: save.saved.name, data: save.saved.data }}
            labels={LABELS}
            onKeepMine={() => save.keepMine(siteInputSchema.parse(value), { onSuccess: done })}
            onTakeSaved={() => {
              const s = save.takeSaved();
              if (s) {
                setName(s.name);
                setAddress(s.data.address);
              }
            }}
          />
        </div>
      )}
    </form>
  );
}
