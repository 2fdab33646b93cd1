import type { AgentInput, AgentUpdate } from '../../shared/schemas/workspace';
import type { AgentRecord } from '../../shared/schemas/workspace-views';
import { withTransaction, type Db } from '../db/knex';
import { notFound } from '../lib/app-error';
import { editAtVersion } from '../lib/version-conflict';
import { auditOf, type Actor } from '../audit/audit.repo';
import { changesOf } from '../audit/changes';
import { agents } from './agents.repo';
import { rejudgeAgentRuns } from '../verdicts/rejudge-agent-runs';
import { agentLimit } from '../../shared/verdict/index';

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
  // The override path is this same edit: a stale save is refused, so it can never put an old limit back.
  async update(db: Db, actor: Actor, id: number, { version, ...input }: AgentUpdate): Promise<AgentRecord> {
    return withTransaction(db, async (trx) => {
      const { before, after } = await editAtVersion(trx, agents, 'dust agent', id, version, input);
      const overridden = JSON.stringify(before.data.override) !== JSON.stringify(input.data.override);
      const scenariosRejudged = await rejudgeAgentRuns(trx, id, input.data);
      const changes = changesOf({ name: before.name, data: before.data }, { name: after.name, data: after.data });
      await auditAgent(
        trx,
        actor,
        overridden ? 'agent.limit_overridden' : 'agent.changed',
        id,
        // The limit before and after, and every scenario whose runs were judged afresh against it.
        {
          name: after.name,
          version: after.version,
          ...(overridden ? { override: input.data.override, scenariosRejudged } : {}),
          limitBefore: agentLimit(before.data),
          limitAfter: agentLimit(input.data),
          changes,
        },
      );
      return after;
    });
  },
};
