import type { AgentData } from '../../shared/schemas/workspace';
import type { Conn } from '../db/knex';
import { runsOfAgent, updateRunVerdict } from '../scenarios/runs.repo';
import { currentLimit, judgeStored } from './run-verdict';

/**
 * Reads judge afresh anyway; this keeps the stored columns (what lists sort by) in step with a new
 * limit, and names the scenarios it touched for the audit trail.
 */
export async function rejudgeAgentRuns(trx: Conn, agentId: number, data: AgentData): Promise<number[]> {
  const runs = await runsOfAgent(trx, agentId);
  const limit = currentLimit(data, null);
  for (const run of runs) {
    const v = judgeStored(run.verdictNumbers, limit);
    await updateRunVerdict(trx, run.id, {
      limitFraction: v?.fraction ?? null,
      percentOfLimit: v?.percentOfLimit ?? null,
      ratingCategory: v?.ratingCategory ?? null,
      banner: v?.banner ?? null,
    });
  }
  return [...new Set(runs.map((r) => r.scenarioId))];
}
