import type { Approval } from '../../shared/schemas/workspace-views';
import type { Db } from '../db/knex';

export type CurrentApproval = Approval;

const today = () => new Date().toISOString().slice(0, 10);

// Needs review when the review date has passed or the scenario changed after the approved run.
export async function currentApproval(db: Db, workstationId: number): Promise<CurrentApproval | null> {
  const a = await db('approvals as ap')
    .join('scenarios as s', 's.id', 'ap.scenario_id')
    .join('runs as r', 'r.id', 'ap.run_id')
    .join('people as p', 'p.id', 'ap.approved_by')
    .where('ap.workstation_id', workstationId)
    .whereNull('ap.superseded_at')
    .orderBy('ap.id', 'desc')
    .select('ap.*', 's.name as scenario_name', 's.input_hash as scenario_hash', 's.deleted_at as scenario_deleted', 'r.input_hash as run_hash', 'r.banner', 'r.percent_of_limit', 'p.name as approver')
    .first();
  if (!a) return null;
  const expired = a.review_date < today();
  const outOfDate = a.scenario_hash !== a.run_hash || a.scenario_deleted != null;
  return {
    id: a.id,
    scenarioId: a.scenario_id,
    scenarioName: a.scenario_name,
    runId: a.run_id,
    note: a.note,
    reviewDate: a.review_date,
    approvedAt: a.approved_at,
    approvedBy: a.approver,
    banner: a.banner,
    percentOfLimit: a.percent_of_limit,
    expired,
    outOfDate,
    needsReview: expired || outOfDate,
  };
}
