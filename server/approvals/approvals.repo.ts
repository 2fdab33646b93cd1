import type { Approval } from '../../shared/schemas/workspace-views';
import type { Conn } from '../db/knex';
import type { ApprovalRow } from '../db/tables';
import { approvalReview } from './review-rule';
import { currentLimit, judgeStored } from '../verdicts/run-verdict';
import type { VerdictNumbers } from '../verdicts/verdict-numbers';
import { watchCause } from './watch-cause';

export type CurrentApproval = Approval;

type JoinedRow = ApprovalRow & {
  scenario_name: string;
  scenario_hash: string;
  scenario_deleted: string | null;
  run_hash: string;
  run_engine_version: string;
  verdict_numbers: string | null;
  agent_data: string | null;
  scenario_input: string;
  approver: string;
};

const today = () => new Date().toISOString().slice(0, 10);

// Needs review when the review date has passed, the scenario changed after the approved run, the engine's major
// version moved on, the agent's limit is no longer the one approved under, or the run judged against today's limit is Act.
export async function currentApproval(db: Conn, workstationId: number, currentEngineVersion?: string): Promise<CurrentApproval | null> {
  const a: JoinedRow | undefined = await db('approvals as ap')
    .join('scenarios as s', 's.id', 'ap.scenario_id')
    .join('runs as r', 'r.id', 'ap.run_id')
    .join('people as p', 'p.id', 'ap.approved_by')
    .leftJoin('dust_agents as ag', 'ag.id', 's.agent_id')
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
      'r.verdict_numbers',
      'ag.data as agent_data',
      's.input as scenario_input',
      'p.name as approver',
    )
    .first();
  if (!a) return null;
  const expired = a.review_date < today();
  const outOfDate = a.scenario_hash !== a.run_hash || a.scenario_deleted != null;
  const review = approvalReview({ expired, outOfDate, runEngineVersion: a.run_engine_version }, currentEngineVersion);
  const limit = currentLimit(a.agent_data, a.scenario_input);
  const verdict = judgeStored(a.verdict_numbers, limit);
  const numbers = a.verdict_numbers ? (JSON.parse(a.verdict_numbers) as VerdictNumbers) : null;
  const limitChanged = a.limit_mgPerM3 != null && (limit?.value_mgPerM3 !== a.limit_mgPerM3 || limit?.fraction !== a.limit_fraction);
  return {
    id: a.id,
    scenarioId: a.scenario_id,
    scenarioName: a.scenario_name,
    runId: a.run_id,
    note: a.note,
    reviewDate: a.review_date,
    approvedAt: a.approved_at,
    approvedBy: a.approver,
    banner: verdict?.banner ?? null,
    percentOfLimit: verdict?.percentOfLimit ?? null,
    expired,
    outOfDate,
    ...review,
    limitChanged,
    needsReview: review.needsReview || limitChanged || !verdict || verdict.banner === 'act',
    reviewReason:
      [
        review.reviewReason,
        limitChanged ? 'the limit has changed since approval' : null,
        !verdict
          ? 'the approved run cannot be judged against the current limit'
          : verdict.banner === 'act'
            ? 'the approved run is above the current limit'
            : null,
      ]
        .filter(Boolean)
        .join('; ') || null,
    watchCause: watchCause(verdict, numbers?.captureVelocity),
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
  limitFraction: string | null;
  limit_mgPerM3: number | null;
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
      limit_fraction: a.limitFraction,
      limit_mgPerM3: a.limit_mgPerM3,
    })
    .returning('id');
  return typeof row === 'object' ? row.id : row;
}
