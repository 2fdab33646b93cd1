import { dateText } from '../../../shared/format/index';
import type { ScenarioDetail } from '../../../shared/schemas/workspace-views';
import { Can } from '@/components/can';
import { auditKeys } from '@/features/audit/api/get-audit';
import { ApproveForm } from '@/features/decisions/components/approve-form';
import { ShareForm } from '@/features/decisions/components/share-form';
import { boardKeys } from '@/features/station-board/api/get-boards';
import { placeKeys } from '@/features/places/api/get-sites';
import { scenarioKeys } from '@/features/scenarios/api/get-scenarios';
import { SavedRuns } from '@/features/scenarios/components/saved-runs';

// The scenario and every list of scenarios, the workstation pages, the operators' boards and the audit trail.
const AFTER_APPROVAL = [scenarioKeys.all, placeKeys.all, boardKeys.all, auditKeys.all] as const;

export function ScenarioRecords({ scenario }: { scenario: ScenarioDetail }) {
  const latest = scenario.runs[0];
  return (
    <section aria-labelledby="records-heading" className="mt-10 space-y-6">
      <div>
        <h2 id="records-heading">Saved runs</h2>
        <div className="mt-3">
          <SavedRuns runs={scenario.runs} scenarioName={scenario.name} />
        </div>
      </div>
      <Can permission="scenarios:approve">
        <div className="rounded-lg border border-line bg-white p-4">
          <h2>Approve as the station's current control</h2>
          <p className="mb-3 text-sm text-muted">
            Uses the latest saved run.{' '}
            {scenario.approval
              ? `Currently approved at this station: “${scenario.approval.scenarioName}”, review by ${dateText(scenario.approval.reviewDate)}.`
              : 'Nothing is approved at this station yet.'}
          </p>
          {/* Keyed by run: a newly saved run brings its own suggested review date. */}
          <ApproveForm
            key={latest?.id ?? 'no run'}
            refresh={AFTER_APPROVAL}
            scenarioId={scenario.id}
            run={latest ? { id: latest.id, banner: latest.banner, outOfDate: latest.outOfDate } : null}
          />
        </div>
      </Can>
      <Can permission="reports:share">
        <div className="rounded-lg border border-line bg-white p-4">
          <h2>Share</h2>
          <ShareForm scenarioId={scenario.id} runId={latest?.id} />
        </div>
      </Can>
    </section>
  );
}
