import { Link, useSearchParams } from 'react-router-dom';
import { Can } from '@/components/can';
import { Cautions } from '@/components/cautions';
import { Page } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { useAgents } from '@/features/agents/api/get-agents';
import { useSites } from '@/features/places/api/get-sites';
import { ScenarioFilters, type FilterValue } from '@/features/scenarios/components/scenario-filters';
import { ScenariosTable } from '@/features/scenarios/components/scenarios-table';

const NUMERIC = ['siteId', 'workstationId', 'agentId'] as const;

// Filters and sort live in the URL so a filtered list can be bookmarked or shared.
export function ScenariosRoute() {
  const [params, setParams] = useSearchParams();
  const sites = useSites().data?.items ?? [];
  const agents = useAgents().data?.items ?? [];
  const workstations = sites.flatMap((s) =>
    s.rooms.flatMap((r) => r.workstations.map((w) => ({ id: w.id, name: `${w.name} (${s.name})` }))),
  );

  const value: FilterValue = { q: params.get('q') ?? undefined, status: (params.get('status') as FilterValue['status']) ?? undefined };
  for (const k of NUMERIC) if (params.get(k)) value[k] = Number(params.get(k));
  const filtered = Object.values(value).some((v) => v !== undefined && v !== '');
  const empty = filtered
    ? { title: 'No scenario matches these filters', hint: 'Clear a filter to see more.' }
    : { title: 'No scenarios yet', hint: 'Open a workstation and add an option there.' };
  const sort = params.get('sort') ?? 'updatedAt';
  const order = (params.get('order') as 'asc' | 'desc') ?? 'desc';

  const update = (next: Record<string, string | number | undefined>) => {
    const p = new URLSearchParams(params);
    for (const [k, v] of Object.entries(next)) {
      if (v === undefined || v === '') p.delete(k);
      else p.set(k, String(v));
    }
    setParams(p, { replace: true });
  };

  return (
    <Page
      title="Scenarios"
      intro="Each scenario is one workstation with its controls and dust. The last saved run gives the 8-h TWA and % of limit of the limit's own fraction, and the banner; a run made before the scenario changed is marked out of date."
      actions={
        <Can permission="scenarios:write">
          <Link to={paths.places} className="rounded-md bg-accent px-4 py-2 text-sm font-semibold text-white hover:bg-accent-strong">
            Add a scenario at a workstation
          </Link>
        </Can>
      }
    >
      <ScenarioFilters
        sites={sites}
        workstations={workstations}
        agents={agents}
        value={value}
        onChange={(v) => update({ q: v.q, status: v.status, siteId: v.siteId, workstationId: v.workstationId, agentId: v.agentId })}
      />
      <ScenariosTable filters={{ ...value, sort, order }} empty={empty} onSortChange={(s) => update({ sort: s.key, order: s.dir })} />
      <Cautions />
    </Page>
  );
}
