import { dateText } from '../../../../shared/format/index';
import { Link } from 'react-router-dom';
import type { SizeProfileSummary } from '../../../../shared/schemas/size-profiles';
import { metresToMicrometres } from '../../../../shared/units';
import { Can } from '@/components/can';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { paths } from '@/config/paths';
import { useDeleteSizeProfile } from '@/features/size-profiles/api/delete-size-profile';
import { percent, plain } from '@/features/size-profiles/lib/chart-data';
import { KIND_LABELS } from './kind-labels';

export function SizeProfilesTable({ rows }: { rows: SizeProfileSummary[] }) {
  const remove = useDeleteSizeProfile();
  const columns: Column<SizeProfileSummary>[] = [
    {
      key: 'name',
      header: 'Name',
      sortValue: (p) => p.name.toLowerCase(),
      render: (p) => (
        <Link to={paths.sizeProfile(p.id)} className="font-semibold text-accent underline">
          {p.name}
        </Link>
      ),
    },
    { key: 'kind', header: 'Kind', sortValue: (p) => p.kind, render: (p) => KIND_LABELS[p.kind] },
    {
      key: 'mmad',
      header: 'Fitted MMAD (µm)',
      align: 'right',
      sortValue: (p) => p.fittedMmad_m,
      render: (p) => plain(p.fittedMmad_m === null ? null : metresToMicrometres(p.fittedMmad_m)),
    },
    { key: 'gsd', header: 'GSD', align: 'right', sortValue: (p) => p.fittedGsd, render: (p) => plain(p.fittedGsd) },
    {
      key: 'respirable',
      header: 'Respirable',
      align: 'right',
      sortValue: (p) => p.respirableFraction,
      render: (p) => percent(p.respirableFraction),
    },
    {
      key: 'created',
      header: 'Added',
      sortValue: (p) => p.createdAt,
      render: (p) => `${dateText(p.createdAt)}${p.createdBy ? ` · ${p.createdBy.name}` : ''}`,
    },
    {
      key: 'actions',
      header: 'Actions',
      render: (p) => (
        <Can permission="scenarios:write">
          <Button
            variant="danger"
            className="px-2 py-1 text-xs"
            disabled={remove.isPending}
            onClick={() =>
              window.confirm(`Delete the size profile “${p.name}”? Scenarios that used it keep their copy.`) && remove.mutate(p.id)
            }
          >
            Delete
          </Button>
        </Can>
      ),
    },
  ];
  return (
    <DataTable caption="Size profiles" rows={rows} columns={columns} rowKey={(p) => p.id} initialSort={{ key: 'created', dir: 'desc' }} />
  );
}
