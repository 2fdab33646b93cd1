import { useState } from 'react';
import { decimalOrNaN, trimSig } from '../../../../shared/format/index';
import { workstationInputSchema } from '../../../../shared/schemas/workspace';
import type { SiteTree, WorkstationRecord } from '../../../../shared/schemas/workspace-views';
import {
  POSTURE_BREATHING_HEIGHT_m,
  POSTURE_LABEL,
  POSTURES,
  RELEASE_TYPE_LABEL,
  RELEASE_TYPES,
  type Posture,
} from '../../../../shared/vocabulary/index';
import { SelectField, TextField } from '@/components/ui/field';
import { VersionConflict } from '@/components/version-conflict';
import { useSchemaSubmit } from '@/hooks/use-schema-submit';
import { useCreateWorkstation } from '@/features/places/api/create-place';
import { useUpdateWorkstation } from '@/features/places/api/update-place';
import { heightForPosture } from '@/features/places/lib/posture-height';
import { usePlaceSave } from '@/features/places/lib/use-place-save';
import { FormEnd, ParentField, formBox } from './place-form-parts';

const n = decimalOrNaN;
const POINTS = [
  ['source.x_m', 'Source x', '2'],
  ['source.y_m', 'Source y', '2'],
  ['source.z_m', 'Release height', '0.9'],
  ['worker.x_m', 'Nose/mouth x', '2.5'],
  ['worker.y_m', 'Nose/mouth y', '2'],
] as const;
type PointKey = (typeof POINTS)[number][0] | 'worker.z_m';

const LABELS: Record<string, string> = {
  name: 'Workstation name',
  'data.description': 'What happens here',
  'data.source.x_m': 'Source x (m)',
  'data.source.y_m': 'Source y (m)',
  'data.source.z_m': 'Release height (m)',
  'data.worker.x_m': 'Nose/mouth x (m)',
  'data.worker.y_m': 'Nose/mouth y (m)',
  'data.worker.z_m': 'Breathing-zone height (m)',
  'data.worker.posture': 'Posture',
  'data.releaseType': 'Release type for new options',
};

function fromWorkstation(ws?: WorkstationRecord) {
  const d = ws?.data;
  const posture: Posture = d?.worker.posture ?? 'standing';
  const vals = Object.fromEntries(POINTS.map(([k, , fallback]) => [k, fallback])) as Record<PointKey, string>;
  vals['worker.z_m'] = String(POSTURE_BREATHING_HEIGHT_m[posture]);
  if (d)
    for (const part of ['source', 'worker'] as const)
      for (const axis of ['x_m', 'y_m', 'z_m'] as const) vals[`${part}.${axis}`] = trimSig(d[part][axis], 6);
  return { name: ws?.name ?? '', description: d?.description ?? '', releaseType: d?.releaseType ?? 'active', posture, vals };
}

export function WorkstationForm({
  sites,
  workstation,
  onDone,
}: {
  sites: SiteTree[];
  workstation?: WorkstationRecord;
  onDone?: () => void;
}) {
  const rooms = sites.flatMap((s) => s.rooms.map((r) => ({ id: r.id, name: `${r.name} (${s.name})` })));
  const [roomId, setRoomId] = useState<number | null>(workstation?.roomId ?? null);
  const [f, setF] = useState(() => fromWorkstation(workstation));
  const save = usePlaceSave(workstation, useCreateWorkstation(), useUpdateWorkstation());
  const point = (p: 'source' | 'worker') => ({ x_m: n(f.vals[`${p}.x_m`]), y_m: n(f.vals[`${p}.y_m`]), z_m: n(f.vals[`${p}.z_m`]) });
  const value = {
    roomId: roomId ?? undefined,
    name: f.name,
    data: {
      description: f.description,
      source: point('source'),
      worker: { ...point('worker'), posture: f.posture },
      releaseType: f.releaseType,
    },
  };
  const done = () => {
    if (!workstation) setF((x) => ({ ...x, name: '' }));
    onDone?.();
  };
  const { errors, submit } = useSchemaSubmit(workstationInputSchema, value, save.mutation, done);
  const parsed = workstationInputSchema.safeParse(value);
  const setVal = (k: PointKey, v: string) => setF({ ...f, vals: { ...f.vals, [k]: v } });
  const pointField = (k: PointKey, label: string, hint?: string) => (
    <TextField
      key={k}
      label={label}
      unit="m"
      inputMode="decimal"
      value={f.vals[k]}
      onChange={(e) => setVal(k, e.target.value)}
      error={errors[`data.${k}`]}
      hint={hint}
    />
  );
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={workstation ? `Edit workstation ${workstation.name}` : 'New workstation'}
      className={formBox}
    >
      {!workstation && <ParentField label="Room" options={rooms} value={roomId} onChange={setRoomId} missing={Boolean(errors.roomId)} />}
      <TextField label="Workstation name" value={f.name} onChange={(e) => setF({ ...f, name: e.target.value })} error={errors.name} />
      <TextField label="What happens here" value={f.description} onChange={(e) => setF({ ...f, description: e.target.value })} />
      {POINTS.map(([k, label]) => pointField(k, label))}
      <SelectField
        label="Worker's posture"
        value={f.posture}
        onChange={(e) => {
          const to = e.target.value as Posture;
          setF({ ...f, posture: to, vals: { ...f.vals, 'worker.z_m': heightForPosture(f.vals['worker.z_m'], f.posture, to) } });
        }}
      >
        {POSTURES.map((p) => (
          <option key={p} value={p}>
            {POSTURE_LABEL[p]}
          </option>
        ))}
      </SelectField>
      {pointField(
        'worker.z_m',
        'Breathing-zone height',
        `Typically about ${POSTURE_BREATHING_HEIGHT_m[f.posture]} m ${f.posture}; use the measured height if known`,
      )}
      <SelectField
        label="Release type for new options"
        value={f.releaseType}
        onChange={(e) => setF({ ...f, releaseType: e.target.value as typeof f.releaseType })}
      >
        {RELEASE_TYPES.map((r) => (
          <option key={r} value={r}>
            {RELEASE_TYPE_LABEL[r].description}
          </option>
        ))}
      </SelectField>
      <FormEnd noun="Workstation" mutation={save.outcome} editing={Boolean(workstation)} onCancel={workstation ? onDone : undefined} />
      {save.saved && (
        <div className="sm:col-span-3">
          <VersionConflict
            what="workstation"
            mine={parsed.success ? { name: parsed.data.name, data: parsed.data.data } : value}
            saved={save.saved}
            savedFields={{ name: save.saved.name, data: save.saved.data }}
            labels={LABELS}
            onKeepMine={() => parsed.success && save.keepMine(parsed.data, { onSuccess: done })}
            onTakeSaved={() => {
              const s = save.takeSaved();
              if (s) setF(fromWorkstation(s));
            }}
          />
        </div>
      )}
    </form>
  );
}
