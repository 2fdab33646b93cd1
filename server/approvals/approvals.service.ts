import { reviewDueDate } from '../../shared/approval/review-date';
import type { ApproveInput } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import { AppError, notFound } from '../lib/app-error';
import { writeAudit } from '../audit/audit.repo';
import { currentApproval } from './approvals.repo';

type Actor = { id: number; email: string };


export async function approveScenario(db: Db, actor: Actor, scenarioId: number, input: ApproveInput) {
  const workstationId = await db.transaction(async (trx) => {
    const scenario = await trx('scenarios').where({ id: scenarioId }).whereNull('deleted_at').first();
    if (!scenario) throw notFound('Scenario');
    const run = await trx('runs').where({ id: input.runId, scenario_id: scenarioId }).whereNull('deleted_at').first();
    if (!run) throw new AppError(400, 'invalid_input', 'Choose a saved run of this scenario', [{ path: 'body.runId', message: `Run ${input.runId} is not a saved run of this scenario` }]);
    if (run.input_hash !== scenario.input_hash) throw new AppError(409, 'run_out_of_date', 'The scenario changed after this run. Run it again and save the run before approving.');
    if (run.banner === 'act') throw new AppError(409, 'above_limit', 'This run is above the limit (Act). An option that fails its limit cannot be approved as the current control.');
    const reviewDate = input.reviewDate ?? reviewDueDate(run.banner, new Date());
    if (reviewDate <= new Date().toISOString().slice(0, 10)) throw new AppError(400, 'invalid_input', 'The review date must be in the future', [{ path: 'body.reviewDate', message: 'Pick a later date' }]);
    const now = new Date().toISOString();
    await trx('approvals').where({ workstation_id: scenario.workstation_id }).whereNull('superseded_at').update({ superseded_at: now });
    await trx('scenarios').where({ workstation_id: scenario.workstation_id, status: 'approved' }).update({ status: 'draft' });
    await trx('scenarios').where({ id: scenarioId }).update({ status: 'approved' });
    const [row] = await trx('approvals')
      .insert({ workstation_id: scenario.workstation_id, scenario_id: scenarioId, run_id: run.id, note: input.note, review_date: reviewDate, approved_by: actor.id, approved_at: now })
      .returning('id');
    await writeAudit(trx, { actor, action: 'scenario.approved', targetType: 'scenario', targetId: scenarioId, detail: { approvalId: typeof row === 'object' ? row.id : row, runId: run.id, reviewDate, note: input.note, workstationId: scenario.workstation_id } });
    return scenario.workstation_id as number;
  });
  return currentApproval(db, workstationId);
}
