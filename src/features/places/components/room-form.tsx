import { useState } from 'react';
import { decimalOrNaN, trimSig } from '../../../../shared/format/index';
import { roomInputSchema, type RoomInput } from '../../../../shared/schemas/workspace';
import type { RoomRecord, SiteTree } from '../../../../shared/schemas/workspace-views';
import { celsiusToKelvin, kelvinToCelsius } from '../../../../shared/units';
import { SelectField, TextField } from '@/components/ui/field';
import { VersionConflict } from '@/components/version-conflict';
import { useSchemaSubmit } from '@/hooks/use-schema-submit';
import { sig } from '@/lib/format';
import { useCreateRoom } from '@/features/places/api/create-place';
import { useUpdateRoom } from '@/features/places/api/update-place';
import { otherVentilationFigure, switchVentilation, type VentilationEntered } from '@/features/places/lib/room-ventilation';
import { usePlaceSave } from '@/features/places/lib/use-place-save';
import { FormEnd, ParentField, formBox } from './place-form-parts';

const n = decimalOrNaN;
const LABELS: Record<string, string> = {
  name: 'Room name',
  'data.length_m': 'Length (m)',
  'data.width_m': 'Width (m)',
  'data.height_m': 'Height (m)',
  'data.ventilationEntered': 'Ventilation given as',
  'data.airChanges_perH': 'Air changes (per h)',
  'data.supplyAirflow_m3PerH': 'Supply airflow (m³/h)',
  'data.draftSpeed_mPerS': 'Draft speed (m/s)',
  'data.draftDirection_deg': 'Draft direction (° from +x)',
  'data.temperature_K': 'Temperature (K)',
};

const FIELDS = [
  ['length_m', 'Length', 'm'],
  ['width_m', 'Width', 'm'],
  ['height_m', 'Height', 'm'],
  ['draftSpeed_mPerS', 'Draft speed', 'm/s'],
  ['draftDirection_deg', 'Draft direction', '° from +x'],
  ['temperature_C', 'Temperature', '°C'],
] as const;

type Figures = Record<(typeof FIELDS)[number][0] | 'airChanges_perH' | 'supplyAirflow_m3PerH', string>;

function fromRoom(room?: RoomRecord): { name: string; entered: VentilationEntered; vals: Figures } {
  const d = room?.data;
  const s = (v: number | undefined, fallback: string) => (v === undefined ? fallback : trimSig(v, 6));
  return {
    name: room?.name ?? '',
    entered: d?.ventilationEntered ?? 'airChanges',
    vals: {
      length_m: s(d?.length_m, '8'),
      width_m: s(d?.width_m, '6'),
      height_m: s(d?.height_m, '3'),
      airChanges_perH: s(d?.airChanges_perH, '4'),
      supplyAirflow_m3PerH: s(d?.supplyAirflow_m3PerH, ''),
      draftSpeed_mPerS: s(d?.draftSpeed_mPerS, '0.1'),
      draftDirection_deg: s(d?.draftDirection_deg, '0'),
      temperature_C: d ? trimSig(kelvinToCelsius(d.temperature_K), 6) : '20',
    },
  };
}

export function RoomForm({ sites, room, onDone }: { sites: SiteTree[]; room?: RoomRecord; onDone?: () => void }) {
  const [siteId, setSiteId] = useState<number | null>(room?.siteId ?? null);
  const [f, setF] = useState(() => fromRoom(room));
  const save = usePlaceSave(room, useCreateRoom(), useUpdateRoom());
  const { vals, entered } = f;
  const value = {
    siteId: siteId ?? undefined,
    name: f.name,
    data: {
      length_m: n(vals.length_m),
      width_m: n(vals.width_m),
      height_m: n(vals.height_m),
      ventilationEntered: entered,
      ...(entered === 'airChanges' ? { airChanges_perH: n(vals.airChanges_perH) } : { supplyAirflow_m3PerH: n(vals.supplyAirflow_m3PerH) }),
      draftSpeed_mPerS: n(vals.draftSpeed_mPerS),
      draftDirection_deg: n(vals.draftDirection_deg),
      temperature_K: celsiusToKelvin(n(vals.temperature_C)),
    },
  };
  const done = () => {
    if (!room) setF((x) => ({ ...x, name: '' }));
    onDone?.();
  };
  const { errors, submit } = useSchemaSubmit(roomInputSchema, value, save.mutation, done);
  const set = (k: keyof Figures) => (e: { target: { value: string } }) => setF({ ...f, vals: { ...vals, [k]: e.target.value } });
  const other = otherVentilationFigure(vals, entered);
  const ventilationKey = entered === 'airChanges' ? 'airChanges_perH' : 'supplyAirflow_m3PerH';
  const parsed = roomInputSchema.safeParse(value);
  const field = (k: keyof Figures, label: string, unit: string, errorKey: string = k) => (
    <TextField key={k} label={label} unit={unit} inputMode="decimal" value={vals[k]} onChange={set(k)} error={errors[`data.${errorKey}`]} />
  );
  return (
    <form onSubmit={submit} noValidate aria-label={room ? `Edit room ${room.name}` : 'New room'} className={formBox}>
      {!room && <ParentField label="Site" options={sites} value={siteId} onChange={setSiteId} missing={Boolean(errors.siteId)} />}
      <TextField label="Room name" value={f.name} onChange={(e) => setF({ ...f, name: e.target.value })} error={errors.name} />
      {FIELDS.slice(0, 3).map(([k, label, unit]) => field(k, label, unit))}
      <SelectField
        label="General ventilation given as"
        value={entered}
        onChange={(e) => {
          const to = e.target.value as VentilationEntered;
          setF({ ...f, entered: to, vals: switchVentilation(vals, entered, to) });
        }}
      >
        <option value="airChanges">Air changes per hour</option>
        <option value="supplyAirflow">Supply airflow (m³/h)</option>
      </SelectField>
      <TextField
        label={entered === 'airChanges' ? 'Air changes' : 'Supply airflow'}
        unit={entered === 'airChanges' ? 'per h' : 'm³/h'}
        inputMode="decimal"
        value={vals[ventilationKey]}
        onChange={set(ventilationKey)}
        error={errors[`data.${ventilationKey}`]}
        hint={
          other === null
            ? undefined
            : entered === 'airChanges'
              ? `= ${sig(other)} m³/h of supply air`
              : `= ${sig(other)} air changes per hour`
        }
      />
      {FIELDS.slice(3).map(([k, label, unit]) => field(k, label, unit, k === 'temperature_C' ? 'temperature_K' : k))}
      <FormEnd noun="Room" mutation={save.outcome} editing={Boolean(room)} onCancel={room ? onDone : undefined} />
      {save.saved && (
        <div className="sm:col-span-3">
          <VersionConflict
            what="room"
            mine={parsed.success ? { name: parsed.data.name, data: parsed.data.data } : value}
            saved={save.saved}
            savedFields={{ name: save.saved.name, data: save.saved.data }}
            labels={LABELS}
            onKeepMine={() => parsed.success && save.keepMine(parsed.data as RoomInput, { onSuccess: done })}
            onTakeSaved={() => {
              const s = save.takeSaved();
              if (s) setF(fromRoom(s));
            }}
          />
        </div>
      )}
    </form>
  );
}
