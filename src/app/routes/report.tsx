import { countText } from '../../../shared/format/index';
import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { parseScenario } from '../../../shared/schemas/scenario';
import type { ScenarioDetail } from '../../../shared/schemas/workspace-views';
import { ErrorMessage, Spinner } from '@/components/ui/status';
import { paths } from '@/config/paths';
import { dateTime } from '@/lib/format';
import { useAgents } from '@/features/agents/api/get-agents';
import { useAudit } from '@/features/audit/api/get-audit';
import { ReportDocument } from '@/features/report/components/report-document';
import { RunResults } from '@/features/run-results/components/run-results';
import { runQueryOptions } from '@/features/scenarios/api/get-run';
import { useScenario } from '@/features/scenarios/api/get-scenario';
import { useSizeProfile } from '@/features/size-profiles/api/get-size-profile';

export function ReportRoute() {
  const id = Number(useParams().id);
  const query = useScenario(id);
  if (query.isPending) return <Spinner label="Loading the scenario…" />;
  if (query.error) return <ErrorMessage error={query.error} />;
  return <Report detail={query.data} />;
}

function Report({ detail }: { detail: ScenarioDetail }) {
  const [params, setParams] = useSearchParams();
  // Runs arrive newest first, so the default is the latest saved run.
  const runId = Number(params.get('run')) || detail.runs[0]?.id;
  const run = useQuery({ ...runQueryOptions(runId ?? 0), enabled: Boolean(runId) });
  const agent = useAgents().data?.items.find((a) => a.id === detail.agentId);
  const profile = useSizeProfile(detail.sizeProfileId ?? 0);
  // Who ran it lives in the audit trail; a reader without it sees "not recorded" rather than an error.
  const audit = useAudit({ action: 'run.saved', workstationId: detail.workstationId });
  const ranBy = audit.data?.items.find((e) => e.detail?.runId === runId)?.actorName ?? null;
  const current = useMemo(() => parseScenario(detail.input), [detail.input]);

  if (runId && run.isPending) return <Spinner label="Loading the saved run…" />;
  if (run.error) return <ErrorMessage error={run.error} />;
  const r = runId ? run.data : undefined;
  const input = r?.input ?? current;

  const picker = (
    <label className="flex flex-wrap items-center gap-2">
      <span className="font-semibold">Run reported</span>
      <select
        className="max-w-full rounded-md border border-line bg-white px-2 py-1"
        value={runId ?? ''}
        onChange={(e) => setParams({ run: e.target.value })}
        disabled={detail.runs.length === 0}
      >
        {detail.runs.length === 0 && <option value="">no saved runs</option>}
        {detail.runs.map((x) => (
          <option
            key={x.id}
            value={x.id}
          >{`${dateTime(x.created_at)} · ${countText(x.particles)} particles${x.outOfDate ? ' · out of date' : ''}`}</option>
        ))}
      </select>
      <Link className="underline" to={paths.scenario(detail.id)}>
        open the scenario
      </Link>
    </label>
  );

  return (
    <ReportDocument
      scenarioId={detail.id}
      title={detail.name}
      place={{ workstation: detail.workstationName, room: detail.roomName, site: detail.siteName }}
      control={detail.controlDescription}
      input={input}
      run={
        r
          ? {
              id: r.id,
              createdAt: r.createdAt,
              ranBy,
              seed: r.seed,
              engineVersion: r.engineVersion,
              particles: r.particles,
              outOfDate: r.outOfDate,
            }
          : null
      }
      agent={agent ? { name: agent.name, data: agent.data } : undefined}
      sizeProfileName={profile.data?.name}
      approval={detail.approval}
      runPicker={picker}
    >
      {r && (
        <RunResults result={r.result} scenario={r.input} agentName={agent?.name} limitSource={r.input.limit?.source} title={detail.name} />
      )}
    </ReportDocument>
  );
}
