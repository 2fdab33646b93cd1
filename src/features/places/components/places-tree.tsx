import { Link } from 'react-router-dom';
import type { SiteTree } from '../../../../shared/schemas/workspace-views';
import { paths } from '@/config/paths';

const room = (r: SiteTree['rooms'][number]) =>
  `${r.data.length_m} × ${r.data.width_m} × ${r.data.height_m} m, ${r.data.airChanges_perH} ACH, draft ${r.data.draftSpeed_mPerS} m/s`;

export function PlacesTree({ sites }: { sites: SiteTree[] }) {
  return (
    <ul className="space-y-4">
      {sites.map((s) => (
        <li key={s.id} className="rounded-lg border border-line bg-white p-4">
          <h2>{s.name}</h2>
          {s.data.address && <p className="text-sm text-muted">{s.data.address}</p>}
          {s.rooms.length === 0 && <p className="mt-2 text-sm text-muted">No rooms yet.</p>}
          <ul className="mt-3 space-y-3">
            {s.rooms.map((r) => (
              <li key={r.id} className="border-l-2 border-line pl-4">
                <p className="font-semibold">
                  {r.name} <span className="font-normal text-muted">· {room(r)}</span>
                </p>
                <ul className="mt-1 space-y-1">
                  {r.workstations.map((w) => (
                    <li key={w.id}>
                      <Link to={paths.workstation(w.id)} className="font-semibold text-accent underline">
                        {w.name}
                      </Link>
                      <span className="text-sm text-muted"> · {w.data.description || 'no description'}</span>
                    </li>
                  ))}
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
