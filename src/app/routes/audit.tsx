import { AuditPage } from '@/features/audit/components/audit-page';
import { useSites } from '@/features/places/api/get-sites';

export function AuditRoute() {
  const sites = useSites().data?.items ?? [];
  const workstations = sites.flatMap((s) =>
    s.rooms.flatMap((r) => r.workstations.map((w) => ({ id: w.id, name: `${w.name} (${s.name})` }))),
  );
  return <AuditPage workstations={workstations} />;
}
