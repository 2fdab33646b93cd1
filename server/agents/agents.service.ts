import type { AgentInput } from '../../shared/schemas/workspace';
import type { AgentRecord } from '../../shared/schemas/workspace-views';
import { withTransaction, type Db } from '../db/knex';
import { notFound } from '../lib/app-error';
import { auditOf, type Actor } from '../audit/audit.repo';
import { changesOf } from '../audit/changes';
import { agents } from './agents.repo';
import { rejudgeAgentRuns } from '../verdicts/rejudge-agent-runs';

const auditAgent = auditOf('agent');

export const agentsService = {
  list(db: Db): Promise<AgentRecord[]> {
    return agents.list(db);
  },
  async get(db: Db, id: number): Promise<AgentRecord> {
    const agent = await agents.get(db, id);
    if (!agent) throw notFound('Dust agent');
    return agent;
  },
  async create(db: Db, actor: Actor, input: AgentInput): Promise<AgentRecord> {
    return withTransaction(db, async (trx) => {
      const id = await agents.insert(trx, { ...input, createdBy: actor.id });
      await auditAgent(trx, actor, 'agent.created', id, { name: input.name });
      return (await agents.get(trx, id))!;
    });
  },
  async update(db: Db, actor: Actor, id: number, input: AgentInput): Promise<AgentRecord> {
    const before = await agents.get(db, id);
    if (!before) throw notFound('Dust agent');
    return withTransaction(db, async (trx) => {
      await agents.update(trx, id, input);
      const overridden = JSON.stringify(before.data.override) !== JSON.stringify(input.data.override);
      const scenariosRejudged = await rejudgeAgentRuns(trx, id, input.data);
      await auditAgent(trx, actor, overridden ? 'agent.limit_overridden' : 'agent.changed', id, {
        ...(overridden ? { override: input.data.override, scenariosRejudged } : {}),
        changes: changesOf({ name: before.name, ...before.data }, { name: input.name, ...input.data }),
      });
      return (await agents.get(trx, id))!;
    });
  },
};
