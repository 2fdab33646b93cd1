import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { RoomData, SiteTree, WorkstationData } from '../../../../shared/schemas/workspace-views';
import { POSTURE_LABEL } from '../../../../shared/vocabulary/index';
import { paths } from '@/config/paths';
import { sig } from '@/lib/format';
import type { PlaceKind } from '@/features/places/api/delete-place';
import { PlaceActions } from './place-actions';
import { RoomForm } from './room-form';
import { SiteForm } from './site-form';
import { WorkstationForm } from './workstation-form';

// The figure the person typed comes first; the other follows from the volume.
function ventilation(d: RoomData): string {
  const ach = `${sig(d.airChanges_perH)} ACH`;
  const supply = d.supplyAirflow_m3PerH === undefined ? null : `${sig(d.supplyAirflow_m3PerH)} m³/h supply`;
  if (!supply) return ach;
  return d.ventilationEntered === 'supplyAirflow' ? `${supply} (${ach})` : `${ach} (${supply})`;
}

const roomText = (d: RoomData) =>
  `${sig(d.length_m)} × ${sig(d.width_m)} × ${sig(d.height_m)} m, ${ventilation(d)}, draft ${sig(d.draftSpeed_mPerS)} m/s`;
const workerText = (d: WorkstationData) => `${POSTURE_LABEL[d.worker.posture].toLowerCase()}, breathing zone ${sig(d.worker.z_m)} m`;

type Editing = { kind: PlaceKind; id: number } | null;

export function PlacesTree({ sites }: { sites: SiteTree[] }) {
  const [editing, setEditing] = useState<Editing>(null);
  const is = (kind: PlaceKind, id: number) => editing?.kind === kind && editing.id === id;
  const close = () => setEditing(null);
  return (
    <ul className="space-y-4">
      {sites.map((s) => (
        <li key={s.id} className="rounded-lg border border-line bg-white p-4">
          {is('site', s.id) ? (
            <SiteForm site={s} onDone={close} />
          ) : (
            <>
              <h2 className="inline">{s.name}</h2>
              <PlaceActions kind="site" id={s.id} name={s.name} onEdit={() => setEditing({ kind: 'site', id: s.id })} />
              {s.data.address && <p className="text-sm text-muted">{s.data.address}</p>}
            </>
          )}
          {s.rooms.length === 0 && <p className="mt-2 text-sm text-muted">No rooms yet.</p>}
          <ul className="mt-3 space-y-3">
            {s.rooms.map((r) => (
              <li key={r.id} className="border-l-2 border-line pl-4">
                {is('room', r.id) ? (
                  <RoomForm sites={sites} room={r} onDone={close} />
                ) : (
                  <p className="font-semibold">
                    {r.name} <span className="font-normal text-muted">· {roomText(r.data)}</span>
                    <PlaceActions kind="room" id={r.id} name={r.name} onEdit={() => setEditing({ kind: 'room', id: r.id })} />
                  </p>
                )}
                <ul className="mt-1 space-y-1">
                  {r.workstations.map((w) =>
                    is('workstation', w.id) ? (
                      <li key={w.id}>
                        <WorkstationForm sites={sites} workstation={w} onDone={close} />
                      </li>
                    ) : (
                      <li key={w.id}>
                        <Link to={paths.workstation(w.id)} className="font-semibold text-accent underline">
                          {w.name}
                        </Link>
                        <span className="text-sm text-muted">
                          {' '}
                          · {w.data.description || 'no description'} · {workerText(w.data)}
                        </span>
                        <PlaceActions
                          kind="workstation"
                          id={w.id}
                          name={w.name}
                          onEdit={() => setEditing({ kind: 'workstation', id: w.id })}
                        />
                      </li>
                    ),
                  )}
                  {r.workstations.length === 0 && <li className="text-sm text-muted">No workstations yet.</li>}
                </ul>
              </li>
            ))}
          </ul>
        </li>
      ))}
    </ul>
  );
}
