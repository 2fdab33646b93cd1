import { dateText } from '../../../shared/format/index';
import { useState } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import { scenarioSchema } from '../../../shared/schemas/scenario';
import { BannerBadge } from '@/components/banner-badge';
import { Can } from '@/components/can';
import { Cautions } from '@/components/cautions';
import { Button } from '@/components/ui/button';
import { Page } from '@/components/ui/page';
import { ErrorMessage, Spinner } from '@/components/ui/status';
import { paths } from '@/config/paths';
import { sig } from '@/lib/format';
import { useWorkstation } from '@/features/places/api/get-sites';
import { useCreateScenario } from '@/features/scenarios/api/create-scenario';
import { workstationGeometry } from '@/features/scenarios/api/new-scenario';
import { ScenariosTable } from '@/features/scenarios/components/scenarios-table';
import { OperatorAssignment } from '@/features/places/components/operator-assignment';
import { usePeople } from '@/features/people/api/get-people';
import { can } from '../../../shared/auth/permissions';
import { useUser } from '@/lib/auth';
import { defaultScenario } from '@/features/scenario-editor/lib/default-scenario';
import type { TableSort } from '@/components/ui/data-table';

export function WorkstationRoute() {
  const id = Number(useParams().id);
  const ws = useWorkstation(id);
  const create = useCreateScenario();
  const navigate = useNavigate();
  const [sort, setSort] = useState<TableSort>({ key: 'name', dir: 'asc' });
  const admin = can(useUser().data?.role, 'boards:assign');
  const people = usePeople({ enabled: admin });
  if (ws.isPending) return <Spinner />;
  if (ws.error) return <ErrorMessage error={ws.error} />;
  const w = ws.data;
  const addOption = () => {
    const input = scenarioSchema.parse(defaultScenario(workstationGeometry(w)));
    create.mutate(
      {
        workstationId: w.id,
        agentId: null,
        sizeProfileId: null,
        name: 'New option',
        controlDescription: '',
        controlTier: input.hoods.length ? 'engineering' : 'none',
        input,
      },
      { onSuccess: (s) => navigate(paths.scenario(s.id)) },
    );
  };
  const a = w.approval;
  return (
    <Page
      title={w.name}
      intro={`${w.data.description || 'No description'} · room ${w.room.name} (${w.room.data.length_m} × ${w.room.data.width_m} × ${w.room.data.height_m} m, ${sig(w.room.data.airChanges_perH)} ACH)`}
      actions={
        <Can permission="scenarios:write">
          <Button onClick={addOption} disabled={create.isPending}>
            Add an option
          </Button>
        </Can>
      }
    >
      <section className="mb-6 rounded-lg border border-line bg-white p-4" aria-label="Current control">
        <h2>Current control</h2>
        {a ? (
          <p className="mt-1 text-sm">
            <strong>{a.scenarioName}</strong> approved by {a.approvedBy} on {dateText(a.approvedAt)}, review by {dateText(a.reviewDate)} ·{' '}
            <BannerBadge banner={a.banner} />
            {a.needsReview && (
              <span className="ml-2 font-semibold text-watch">⟳ needs review{a.reviewReason ? ` (${a.reviewReason})` : ''}</span>
            )}
          </p>
        ) : (
          <p className="mt-1 text-sm text-muted">Nothing approved yet: the operators' board shows Act until an option is approved.</p>
        )}
      </section>
      {admin && people.data && (
        <OperatorAssignment
          workstationId={w.id}
          operators={people.data.items.filter((p) => p.role === 'operator')}
          assigned={w.operatorIds}
        />
      )}
      {create.error && <ErrorMessage error={create.error} />}
      <h2 className="mb-2">Options at this workstation</h2>
      <ScenariosTable
        filters={{ workstationId: w.id, sort: sort.key, order: sort.dir }}
        onSortChange={setSort}
        empty={{ title: 'No options at this workstation yet', hint: 'Add an option to describe its controls and run it.' }}
      />
      <Cautions />
    </Page>
  );
}
