import { useMemo } from 'react';
import { Link, useParams } from 'react-router-dom';
import { parseScenario } from '../../../shared/schemas/scenario';
import { CONTROL_TIERS, type ControlTier } from '../../../shared/schemas/workspace';
import type { ScenarioDetail } from '../../../shared/schemas/workspace-views';
import { Page } from '@/components/ui/page';
import { ErrorMessage, Spinner } from '@/components/ui/status';
import { paths } from '@/config/paths';
import { useWorkstation } from '@/features/places/api/get-sites';
import { useCreateScenario } from '@/features/scenarios/api/create-scenario';
import { useScenario } from '@/features/scenarios/api/get-scenario';
import { SweepPanel, type SavePoint } from '@/features/sweep/components/sweep-panel';

const tierOf = (tier: string): ControlTier => ((CONTROL_TIERS as readonly string[]).includes(tier) ? (tier as ControlTier) : 'engineering');

export function SweepRoute() {
  const id = Number(useParams().id);
  const query = useScenario(id);
  if (query.isPending) return <Spinner label="Loading the scenario…" />;
  if (query.error) return <ErrorMessage error={query.error} />;
  return <SweepWorkspace key={id} detail={query.data} />;
}

function SweepWorkspace({ detail }: { detail: ScenarioDetail }) {
  const workstation = useWorkstation(detail.workstationId);
  const create = useCreateScenario();
  const parsed = useMemo(() => {
    try {
      return { ok: true as const, scenario: parseScenario(detail.input) };
    } catch (error) {
      return { ok: false as const, error };
    }
  }, [detail.input]);

  // A saved point is a sibling option at the same station, with the same dust agent and size profile.
  const savePoint: SavePoint = async (name, input) => {
    const created = await create.mutateAsync({
      workstationId: detail.workstationId,
      agentId: detail.agentId,
      sizeProfileId: detail.sizeProfileId,
      name,
      controlDescription: `${name}, kept from the placement sweep of “${detail.name}”`,
      controlTier: tierOf(detail.controlTier),
      input,
    });
    return { id: created.id, name: created.name };
  };

  return (
    <Page
      title={`Placement sweep of “${detail.name}”`}
      intro={
        <>
          <Link className="underline" to={paths.scenario(detail.id)}>
            back to the scenario
          </Link>{' '}
          ·{' '}
          <Link className="underline" to={paths.workstation(detail.workstationId)}>
            {detail.workstationName}
          </Link>{' '}
          · {detail.siteName}
        </>
      }
    >
      {!parsed.ok ? (
        <ErrorMessage title="The scenario cannot be swept" error={parsed.error} />
      ) : workstation.isPending ? (
        <Spinner label="Loading the workstation…" />
      ) : (
        <SweepPanel
          scenario={parsed.scenario}
          release={parsed.scenario.source.releaseType ?? workstation.data?.data.releaseType ?? 'active'}
          onSavePoint={savePoint}
        />
      )}
    </Page>
  );
}
