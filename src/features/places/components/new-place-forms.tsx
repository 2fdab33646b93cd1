import { decimalOrNaN } from '../../../../shared/format/parse-decimal';
import { RELEASE_TYPE_LABEL, RELEASE_TYPES } from '../../../../shared/vocabulary/index';
import { useState, type ComponentProps } from 'react';
import { roomInputSchema, siteInputSchema, workstationInputSchema } from '../../../../shared/schemas/workspace';
import type { SiteTree } from '../../../../shared/schemas/workspace-views';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { IdSelectField } from '@/components/ui/id-select-field';
import { ErrorMessage, Notice } from '@/components/ui/status';
import { useSchemaSubmit } from '@/hooks/use-schema-submit';
import { useCreateRoom, useCreateSite, useCreateWorkstation } from '@/features/places/api/create-place';

const n = decimalOrNaN;
const box = 'grid gap-3 rounded-lg border border-line bg-white p-4 sm:grid-cols-3';

type ParentProps = Omit<ComponentProps<typeof IdSelectField>, 'none' | 'error'> & { missing: boolean };

// The place a new one sits in; the schema's own message for a missing id means nothing to people.
function ParentField({ missing, ...select }: ParentProps) {
  return <IdSelectField none="Choose…" error={missing ? `Choose a ${select.label.toLowerCase()}` : undefined} {...select} />;
}

type Outcome = { isPending: boolean; isSuccess: boolean; data?: { name: string }; error: unknown };

function FormEnd({ noun, mutation: m }: { noun: string; mutation: Outcome }) {
  return (
    <>
      <Button type="submit" className="self-end" disabled={m.isPending}>
        Add {noun.toLowerCase()}
      </Button>
      {m.isSuccess && (
        <div className="sm:col-span-3">
          <Notice>
            {noun} “{m.data?.name}” added.
          </Notice>
        </div>
      )}
      {m.error && (
        <div className="sm:col-span-3">
          <ErrorMessage error={m.error} />
        </div>
      )}
    </>
  );
}

export function NewSiteForm() {
  const [name, setName] = useState('');
  const [address, setAddress] = useState('');
  const m = useCreateSite();
  const { errors, submit } = useSchemaSubmit(siteInputSchema, { name, data: { address } }, m, () => {
    setName('');
    setAddress('');
  });
  return (
    <form onSubmit={submit} noValidate aria-label="New site" className={box}>
      <TextField label="Site name" value={name} onChange={(e) => setName(e.target.value)} error={errors.name} />
      <TextField label="Address" value={address} onChange={(e) => setAddress(e.target.value)} />
      <FormEnd noun="Site" mutation={m} />
    </form>
  );
}

const ROOM_FIELDS = [
  ['length_m', 'Length', 'm', '8'],
  ['width_m', 'Width', 'm', '6'],
  ['height_m', 'Height', 'm', '3'],
  ['airChanges_perH', 'Air changes', 'per h', '4'],
  ['draftSpeed_mPerS', 'Draft speed', 'm/s', '0.1'],
  ['draftDirection_deg', 'Draft direction', '° from +x', '0'],
  ['temperature_C', 'Temperature', '°C', '20'],
] as const;

export function NewRoomForm({ sites }: { sites: SiteTree[] }) {
  const [siteId, setSiteId] = useState<number | null>(null);
  const [name, setName] = useState('');
  const [vals, setVals] = useState<Record<string, string>>(Object.fromEntries(ROOM_FIELDS.map(([k, , , d]) => [k, d])));
  const m = useCreateRoom();
  const { temperature_C, ...rest } = vals;
  const data = { ...Object.fromEntries(Object.entries(rest).map(([k, v]) => [k, n(v)])), temperature_K: n(temperature_C) + 273.15 };
  const { errors, submit } = useSchemaSubmit(roomInputSchema, { siteId: siteId ?? undefined, name, data }, m, () => setName(''));
  return (
    <form onSubmit={submit} noValidate aria-label="New room" className={box}>
      <ParentField label="Site" options={sites} value={siteId} onChange={setSiteId} missing={Boolean(errors.siteId)} />
      <TextField label="Room name" value={name} onChange={(e) => setName(e.target.value)} error={errors.name} />
      {ROOM_FIELDS.map(([k, label, unit]) => (
        <TextField
          key={k}
          label={label}
          unit={unit}
          inputMode="decimal"
          value={vals[k]}
          onChange={(e) => setVals({ ...vals, [k]: e.target.value })}
          error={errors[`data.${k === 'temperature_C' ? 'temperature_K' : k}`]}
        />
      ))}
      <FormEnd noun="Room" mutation={m} />
    </form>
  );
}

const WS_FIELDS = [
  ['source.x_m', 'Source x', '2'],
  ['source.y_m', 'Source y', '2'],
  ['source.z_m', 'Release height', '0.9'],
  ['worker.x_m', 'Nose/mouth x', '2.5'],
  ['worker.y_m', 'Nose/mouth y', '2'],
  ['worker.z_m', 'Breathing-zone height', '1.5'],
] as const;

export function NewWorkstationForm({ sites }: { sites: SiteTree[] }) {
  const rooms = sites.flatMap((s) => s.rooms.map((r) => ({ id: r.id, name: `${r.name} (${s.name})` })));
  const [roomId, setRoomId] = useState<number | null>(null);
  const [name, setName] = useState('');
  const [description, setDescription] = useState('');
  const [releaseType, setReleaseType] = useState('active');
  const [vals, setVals] = useState<Record<string, string>>(Object.fromEntries(WS_FIELDS.map(([k, , d]) => [k, d])));
  const m = useCreateWorkstation();
  const point = (p: 'source' | 'worker') => ({ x_m: n(vals[`${p}.x_m`]), y_m: n(vals[`${p}.y_m`]), z_m: n(vals[`${p}.z_m`]) });
  const value = {
    roomId: roomId ?? undefined,
    name,
    data: { description, source: point('source'), worker: { ...point('worker'), posture: 'standing' }, releaseType },
  };
  const { errors, submit } = useSchemaSubmit(workstationInputSchema, value, m, () => setName(''));
  return (
    <form onSubmit={submit} noValidate aria-label="New workstation" className={box}>
      <ParentField label="Room" options={rooms} value={roomId} onChange={setRoomId} missing={Boolean(errors.roomId)} />
      <TextField label="Workstation name" value={name} onChange={(e) => setName(e.target.value)} error={errors.name} />
      <TextField label="What happens here" value={description} onChange={(e) => setDescription(e.target.value)} />
      {WS_FIELDS.map(([k, label]) => (
        <TextField
          key={k}
          label={label}
          unit="m"
          inputMode="decimal"
          value={vals[k]}
          onChange={(e) => setVals({ ...vals, [k]: e.target.value })}
          error={errors[`data.${k}`]}
        />
      ))}
      <SelectField label="Release type for new options" value={releaseType} onChange={(e) => setReleaseType(e.target.value)}>
        {RELEASE_TYPES.map((r) => (
          <option key={r} value={r}>
            {RELEASE_TYPE_LABEL[r].description}
          </option>
        ))}
      </SelectField>
      <FormEnd noun="Workstation" mutation={m} />
    </form>
  );
}
