import { type RunCreate, toJsonFriendly } from '../../shared/schemas/runs';
import type { ScenarioCreate, ScenarioListQuery, ScenarioUpdate } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import { AppError, notFound } from '../lib/app-error';
import { inputHash } from '../lib/hash';
import { writeAudit } from '../audit/audit.repo';
import { agents } from '../agents/agents.repo';
import { workstations } from '../places/places.repo';
import { currentApproval } from '../approvals/approvals.repo';
import { getScenarioRow, listRuns, listScenarios, toSummary } from './scenarios.repo';

type Actor = { id: number; email: string };

async function checkRefs(db: Db, v: { workstationId?: number; agentId?: number | null }) {
  if (v.workstationId && !(await workstations.get(db, v.workstationId))) throw new AppError(400, 'invalid_input', 'That workstation does not exist', [{ path: 'body.workstationId', message: `No workstation ${v.workstationId}` }]);
  if (v.agentId && !(await agents.get(db, v.agentId))) throw new AppError(400, 'invalid_input', 'That dust agent does not exist', [{ path: 'body.agentId', message: `No dust agent ${v.agentId}` }]);
}

// An approved option needs review once its approval expired or its scenario changed after the approved run.
export async function listScenariosForReview(db: Db, q: ScenarioListQuery) {
  const page = await listScenarios(db, q);
  const items = await Promise.all(page.items.map(async (s) => ({ ...s, needsReview: s.status === 'approved' ? ((await currentApproval(db, s.workstationId))?.needsReview ?? true) : false })));
  return { ...page, items };
}

export async function getScenario(db: Db, id: number) {
  const row = await getScenarioRow(db, id);
  if (!row) throw notFound('Scenario');
  const runs = await listRuns(db, id);
  return {
    ...toSummary(row),
    input: JSON.parse(row.input),
    inputHash: row.input_hash,
    approval: await currentApproval(db, row.workstation_id as number),
    runs: runs.map((r) => ({ ...r, outOfDate: r.input_hash !== row.input_hash })),
  };
}

export const scenariosService = {
  async create(db: Db, actor: Actor, input: ScenarioCreate) {
    await checkRefs(db, input);
    const id = await db.transaction(async (trx) => {
      const now = new Date().toISOString();
      const [row] = await trx('scenarios')
        .insert({
          workstation_id: input.workstationId,
          agent_id: input.agentId,
          size_profile_id: input.sizeProfileId,
          name: input.name,
          control_description: input.controlDescription,
          control_tier: input.controlTier,
          input: JSON.stringify(input.input),
          input_hash: inputHash(input.input),
          created_by: actor.id,
          updated_by: actor.id,
          created_at: now,
          updated_at: now,
        })
        .returning('id');
      const newId = typeof row === 'object' ? row.id : row;
      await writeAudit(trx, { actor, action: 'scenario.created', targetType: 'scenario', targetId: newId, detail: { name: input.name, workstationId: input.workstationId } });
      return newId as number;
    });
    return getScenario(db, id);
  },

  // Optimistic concurrency: the caller names the version it edited; a newer one wins nothing silently.
  async update(db: Db, actor: Actor, id: number, patch: ScenarioUpdate) {
    await checkRefs(db, patch);
    await db.transaction(async (trx) => {
      const current = await trx('scenarios').where({ id }).whereNull('deleted_at').first();
      if (!current) throw notFound('Scenario');
      if (current.version !== patch.version) {
        throw new AppError(409, 'version_conflict', `Someone saved this scenario after you opened it (your version ${patch.version}, current ${current.version}). Review both before saving again.`, undefined, {
          current: { version: current.version, input: JSON.parse(current.input), name: current.name, controlDescription: current.control_description },
        });
      }
      const cols: Record<string, unknown> = { version: current.version + 1, updated_by: actor.id, updated_at: new Date().toISOString() };
      if (patch.name !== undefined) cols.name = patch.name;
      if (patch.workstationId !== undefined) cols.workstation_id = patch.workstationId;
      if (patch.agentId !== undefined) cols.agent_id = patch.agentId;
      if (patch.sizeProfileId !== undefined) cols.size_profile_id = patch.sizeProfileId;
      if (patch.controlDescription !== undefined) cols.control_description = patch.controlDescription;
      if (patch.controlTier !== undefined) cols.control_tier = patch.controlTier;
      if (patch.input !== undefined) {
        cols.input = JSON.stringify(patch.input);
        cols.input_hash = inputHash(patch.input);
      }
      await trx('scenarios').where({ id }).update(cols);
      await writeAudit(trx, { actor, action: 'scenario.changed', targetType: 'scenario', targetId: id, detail: { version: current.version + 1 } });
    });
    return getScenario(db, id);
  },

  async duplicate(db: Db, actor: Actor, id: number, name?: string) {
    const source = await getScenario(db, id);
    return this.create(db, actor, {
      workstationId: source.workstationId,
      agentId: source.agentId,
      sizeProfileId: source.sizeProfileId,
      name: name ?? `${source.name} (option)`.slice(0, 120),
      controlDescription: source.controlDescription,
      controlTier: source.controlTier as ScenarioCreate['controlTier'],
      input: source.input,
    });
  },

  async remove(db: Db, actor: Actor, id: number) {
    await db.transaction(async (trx) => {
      const current = await trx('scenarios').where({ id }).whereNull('deleted_at').first();
      if (!current) throw notFound('Scenario');
      if (current.status === 'approved') throw new AppError(409, 'approved', 'An approved scenario cannot be deleted; approve another option first.');
      await trx('scenarios').where({ id }).update({ deleted_at: new Date().toISOString() });
      await writeAudit(trx, { actor, action: 'scenario.deleted', targetType: 'scenario', targetId: id });
    });
  },

  async saveRun(db: Db, actor: Actor, id: number, run: RunCreate) {
    const runId = await db.transaction(async (trx) => {
      const current = await trx('scenarios').where({ id }).whereNull('deleted_at').first();
      if (!current) throw notFound('Scenario');
      const fraction = run.result.limit?.fraction ?? 'respirable';
      const summary = run.result.breathingZone.fractions[fraction];
      const [row] = await trx('runs')
        .insert({
          scenario_id: id,
          seed: String(run.result.engine.seed),
          engine_version: run.result.engine.version,
          input_hash: inputHash(run.input),
          particles: run.result.engine.particles,
          limit_fraction: run.result.limit?.fraction ?? null,
          twa8h_mgPerM3: summary.twa8h_mgPerM3,
          twa8h_lo_mgPerM3: summary.twa8hCi95_mgPerM3[0],
          twa8h_hi_mgPerM3: summary.twa8hCi95_mgPerM3[1],
          respirable_twa8h_mgPerM3: run.result.breathingZone.fractions.respirable.twa8h_mgPerM3,
          percent_of_limit: run.result.limit?.percentOfLimit ?? null,
          rating_category: run.result.limit?.ratingCategory ?? null,
          banner: run.result.limit?.banner ?? null,
          input: JSON.stringify(run.input),
          result: JSON.stringify(toJsonFriendly(run.result)),
          created_by: actor.id,
          created_at: new Date().toISOString(),
        })
        .returning('id');
      const newId = (typeof row === 'object' ? row.id : row) as number;
      await writeAudit(trx, { actor, action: 'run.saved', targetType: 'scenario', targetId: id, detail: { runId: newId, particles: run.result.engine.particles, seed: String(run.result.engine.seed) } });
      return newId;
    });
    return getRun(db, runId);
  },
};

export async function getRun(db: Db, runId: number) {
  const run = await db('runs').where({ id: runId }).whereNull('deleted_at').first();
  if (!run) throw notFound('Run');
  const scenario = await db('scenarios').where({ id: run.scenario_id }).first();
  return {
    id: run.id as number,
    scenarioId: run.scenario_id as number,
    scenarioName: scenario?.name as string,
    seed: run.seed as string,
    engineVersion: run.engine_version as string,
    particles: run.particles as number,
    createdAt: run.created_at as string,
    outOfDate: !scenario || scenario.input_hash !== run.input_hash,
    input: JSON.parse(run.input),
    result: JSON.parse(run.result),
  };
}
