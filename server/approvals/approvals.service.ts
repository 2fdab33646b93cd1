import { reviewDueDate } from '../../shared/approval/review-date';
import type { ApproveInput } from '../../shared/schemas/workspace';
import type { Approval } from '../../shared/schemas/workspace-views';
import { withTransaction, type Db } from '../db/knex';
import { AppError, notFound } from '../lib/app-error';
import { auditOf, type Actor } from '../audit/audit.repo';
import { agents } from '../agents/agents.repo';
import { findRunOfScenario } from '../scenarios/runs.repo';
import { runsService } from '../scenarios/runs.service';
import { findScenario, markApproved } from '../scenarios/scenarios.repo';
import { currentLimit, judgeStored } from '../verdicts/run-verdict';
import { currentApproval, replaceApproval } from './approvals.repo';

const auditScenario = auditOf('scenario');

export async function approveScenario(db: Db, actor: Actor, scenarioId: number, input: ApproveInput): Promise<Approval | null> {
  // Before the transaction: a whole replay takes seconds and must not hold the database.
  await runsService.replayWholeRun(db, actor, scenarioId, input.runId);
  const workstationId = await withTransaction(db, async (trx) => {
    const scenario = await findScenario(trx, scenarioId);
    if (!scenario) throw notFound('Scenario');
    const run = await findRunOfScenario(trx, input.runId, scenarioId);
    if (!run)
      throw new AppError(400, 'invalid_input', 'Choose a saved run of this scenario', [
        { path: 'body.runId', message: `Run ${input.runId} is not a saved run of this scenario` },
      ]);
    if (run.inputHash !== scenario.inputHash)
      throw new AppError(409, 'run_out_of_date', 'The scenario changed after this run. Run it again and save the run before approving.');
    // The server's own verdict against today's limit, never the banner stored with the run.
    const agent = scenario.agentId ? await agents.get(trx, scenario.agentId) : undefined;
    const limit = currentLimit(agent?.data ?? null, scenario.input);
    const verdict = judgeStored(run.verdictNumbers, limit);
    if (verdict?.banner === 'act')
      throw new AppError(
        409,
        'above_limit',
        'This run is above the limit (Act). An option that fails its limit cannot be approved as the current control.',
      );
    const reviewDate = input.reviewDate ?? reviewDueDate(verdict?.banner ?? null, new Date());
    if (reviewDate <= new Date().toISOString().slice(0, 10))
      throw new AppError(400, 'invalid_input', 'The review date must be in the future', [
        { path: 'body.reviewDate', message: 'Pick a later date' },
      ]);
    const now = new Date().toISOString();
    await markApproved(trx, scenarioId, scenario.workstationId);
    const approvalId = await replaceApproval(trx, {
      workstationId: scenario.workstationId,
      scenarioId,
      runId: run.id,
      note: input.note,
      reviewDate,
      approvedBy: actor.id,
      approvedAt: now,
      limitFraction: limit?.fraction ?? null,
      limit_mgPerM3: limit?.value_mgPerM3 ?? null,
    });
    await auditScenario(trx, actor, 'scenario.approved', scenarioId, {
      approvalId,
      runId: run.id,
      reviewDate,
      note: input.note,
      workstationId: scenario.workstationId,
    });
    return scenario.workstationId;
  });
  return currentApproval(db, workstationId);
}
