import type { Approval, Banner } from '../../shared/schemas/workspace-views';
import type { Conn } from '../db/knex';
import type { ApprovalRow } from '../db/tables';
import { approvalReview } from './review-rule';

export type CurrentApproval = Approval;

type JoinedRow = ApprovalRow & {
  scenario_name: string;
  scenario_hash: string;
  scenario_deleted: string | null;
  run_hash: string;
  run_engine_version: string;
  banner: string | null;
  percent_of_limit: number | null;
  approver: string;
};

const today = () => new Date().toISOString().slice(0, 10);

// Needs review when the review date has passed, the scenario changed after the approved run, or the engine's major version moved on.
export async function currentApproval(db: Conn, workstationId: number, currentEngineVersion?: string): Promise<CurrentApproval | null> {
  const a: JoinedRow | undefined = await db('approvals as ap')
    .join('scenarios as s', 's.id', 'ap.scenario_id')
    .join('runs as r', 'r.id', 'ap.run_id')
    .join('people as p', 'p.id', 'ap.approved_by')
    .where('ap.workstation_id', workstationId)
    .whereNull('ap.superseded_at')
    .orderBy('ap.id', 'desc')
    .select(
      'ap.*',
      's.name as scenario_name',
      's.input_hash as scenario_hash',
      's.deleted_at as scenario_deleted',
      'r.input_hash as run_hash',
      'r.engine_version as run_engine_version',
      'r.banner',
      'r.percent_of_limit',
      'p.name as approver',
    )
    .first();
  if (!a) return null;
  const expired = a.review_date < today();
  const outOfDate = a.scenario_hash !== a.run_hash || a.scenario_deleted != null;
  const review = approvalReview({ expired, outOfDate, runEngineVersion: a.run_engine_version }, currentEngineVersion);
  return {
    id: a.id,
    scenarioId: a.scenario_id,
    scenarioName: a.scenario_name,
    runId: a.run_id,
    note: a.note,
    reviewDate: a.review_date,
    approvedAt: a.approved_at,
    approvedBy: a.approver,
    banner: a.banner as Banner | null,
    percentOfLimit: a.percent_of_limit,
    expired,
    outOfDate,
    ...review,
  };
}

export type NewApproval = {
  workstationId: number;
  scenarioId: number;
  runId: number;
  note: string;
  reviewDate: string;
  approvedBy: number;
  approvedAt: string;
};

// The workstation's earlier approval stays on record, marked superseded at the new one's time.
export async function replaceApproval(db: Conn, a: NewApproval): Promise<number> {
  await db('approvals').where({ workstation_id: a.workstationId }).whereNull('superseded_at').update({ superseded_at: a.approvedAt });
  const [row] = await db('approvals')
    .insert({
      workstation_id: a.workstationId,
      scenario_id: a.scenarioId,
      run_id: a.runId,
      note: a.note,
      review_date: a.reviewDate,
      approved_by: a.approvedBy,
      approved_at: a.approvedAt,
    })
    .returning('id');
  return typeof row === 'object' ? row.id : row;
}
