import { useEffect, useMemo, useRef, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { can } from '../../../shared/auth/permissions';
import { scenarioSchema, type Scenario, type ScenarioInput } from '../../../shared/schemas/scenario';
import type { ScenarioDetail } from '../../../shared/schemas/workspace-views';
import { BannerBadge } from '@/components/banner-badge';
import { Can } from '@/components/can';
import { Page } from '@/components/ui/page';
import { ErrorMessage, Notice, Spinner } from '@/components/ui/status';
import { paths } from '@/config/paths';
import { useAgents } from '@/features/agents/api/get-agents';
import { useScenario } from '@/features/scenarios/api/get-scenario';
import { RunResults } from '@/features/run-results/components/run-results';
import { ControlFields } from '@/features/scenario-editor/components/control-fields';
import { ScenarioEditor } from '@/features/scenario-editor/components/scenario-editor';
import { UnsavedChangesGuard } from '@/features/scenario-editor/components/unsaved-changes-guard';
import { tierAfterEdit, tierOf } from '@/features/scenario-editor/lib/control-tier';
import { useSizeProfileOptions } from '@/features/size-profiles/api/use-size-profile-options';
import { useUser } from '@/lib/auth';
import type { RunResult } from '../../../shared/schemas/run-result';
import type { ControlTier } from '../../../shared/vocabulary/control-tiers';
import { agentLimit, judgeOptions, withVerdict } from '../../../shared/verdict/index';
import { ScenarioActions } from './scenario-actions';
import { ScenarioRecords } from './scenario-records';
import { ScenarioRunArea } from './scenario-run-area';

export type Draft = {
  input: ScenarioInput;
  name: string;
  agentId: number | null;
  sizeProfileId: number | null;
  controlTier: ControlTier;
  controlDescription: string;
};

const fromDetail = (s: ScenarioDetail): Draft => ({
  input: s.input,
  name: s.name,
  agentId: s.agentId,
  sizeProfileId: s.sizeProfileId,
  controlTier: tierOf(s.controlTier),
  controlDescription: s.controlDescription,
});

export function ScenarioRoute() {
  const id = Number(useParams().id);
  const query = useScenario(id);
  if (query.isPending) return <Spinner label="Loading the scenario…" />;
  if (query.error) return <ErrorMessage error={query.error} />;
  // Keyed by id: opening another scenario starts a fresh draft instead of carrying edits over.
  return <ScenarioWorkspace key={id} initial={query.data} />;
}

function ScenarioWorkspace({ initial }: { initial: ScenarioDetail }) {
  // The draft edits against `base`; runs, status and approval are the server's and follow the live query, so a
  // saved run or an approval shows at once without touching the draft.
  const live = useScenario(initial.id).data ?? initial;
  const user = useUser().data;
  const agents = useAgents().data?.items ?? [];
  const profiles = useSizeProfileOptions();
  const [draft, setDraft] = useState<Draft>(() => fromDetail(initial));
  const [base, setBase] = useState<ScenarioDetail>(initial);
  const [fresh, setFresh] = useState<{ result: RunResult; input: Scenario; ticket?: string } | null>(null);
  const results = useRef<HTMLDivElement>(null);
  const shown: ScenarioDetail = { ...base, runs: live.runs, status: live.status, approval: live.approval, lastRun: live.lastRun };
  const parsed = useMemo(() => scenarioSchema.safeParse(draft.input), [draft]);
  const readOnly = !can(user?.role, 'scenarios:write');
  const dirty = JSON.stringify(fromDetail(base)) !== JSON.stringify(draft);
  const agent = agents.find((a) => a.id === draft.agentId);
  // Judged against the agent's current limit, as the server will judge it once saved.
  const judged = useMemo(
    () => (fresh && agent ? withVerdict(fresh.result, agentLimit(agent.data), judgeOptions(fresh.input)) : null),
    [fresh, agent],
  );
  // After a run the reader's place moves to what it produced.
  useEffect(() => {
    if (fresh) results.current?.focus();
  }, [fresh]);

  return (
    <Page
      title={draft.name}
      intro={
        <>
          <Link className="underline" to={paths.workstation(base.workstationId)}>
            {base.workstationName}
          </Link>{' '}
          · {base.siteName} ·{' '}
          <span data-testid="scenario-status">{shown.status === 'approved' ? '★ approved as the current control' : 'draft'}</span> · version{' '}
          {base.version}
          {shown.lastRun && (
            <>
              {' '}
              · last run <BannerBadge banner={shown.lastRun.banner} />
            </>
          )}
        </>
      }
      actions={
        <ScenarioActions
          scenario={shown}
          draft={draft}
          dirty={dirty}
          valid={parsed.success}
          onSaved={(s) => {
            setBase(s);
            setDraft(fromDetail(s));
          }}
          onReload={(s) => {
            setBase(s);
            setDraft(fromDetail(s));
          }}
        />
      }
    >
      <UnsavedChangesGuard dirty={dirty && !readOnly} />
      {shown.approval?.needsReview && (
        <p role="status" className="mb-4 rounded-md border-2 border-watch bg-watch-soft p-3 text-sm font-semibold text-watch">
          ⟳ Needs review: {shown.approval.reviewReason ?? "the station's approval is due for a look"}.
        </p>
      )}
      {!readOnly && (
        <div className="mb-6 flex max-w-3xl flex-col gap-4">
          <label className="block max-w-md text-sm font-semibold">
            Scenario name
            <input
              className="mt-1 w-full rounded-md border border-line bg-white px-3 py-2"
              value={draft.name}
              onChange={(e) => setDraft({ ...draft, name: e.target.value })}
            />
          </label>
          <ControlFields
            tier={draft.controlTier}
            description={draft.controlDescription}
            onChange={({ tier, description }) => setDraft((d) => ({ ...d, controlTier: tier, controlDescription: description }))}
          />
        </div>
      )}
      {readOnly && <Notice>You can read this scenario and its saved runs; only engineers change or run it.</Notice>}
      <ScenarioEditor
        value={draft.input}
        onChange={(input) => setDraft((d) => ({ ...d, input, controlTier: tierAfterEdit(d.controlTier, d.input, input) }))}
        agents={agents}
        agentId={draft.agentId}
        onAgentChange={(agentId) => setDraft((d) => ({ ...d, agentId }))}
        sizeProfiles={profiles}
        sizeProfileId={draft.sizeProfileId}
        onSizeProfileChange={(sizeProfileId) => setDraft((d) => ({ ...d, sizeProfileId }))}
        readOnly={readOnly}
      />
      <Can permission="runs:write">
        <ScenarioRunArea scenario={base} input={parsed.success ? parsed.data : null} dirty={dirty} fresh={fresh} onFresh={setFresh} />
      </Can>
      {fresh && (
        <div
          ref={results}
          tabIndex={-1}
          aria-label="Results of this run"
          className="outline-none focus-visible:ring-2 focus-visible:ring-accent"
        >
          <RunResults
            result={judged ?? fresh.result}
            scenario={fresh.input}
            agentName={agent?.name}
            limitSource={fresh.input.limit?.source}
            title={draft.name}
          />
        </div>
      )}
      <ScenarioRecords scenario={shown} />
    </Page>
  );
}
