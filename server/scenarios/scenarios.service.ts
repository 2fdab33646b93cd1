import type { RunResult } from '../../shared/schemas/run-result';
import type { ScenarioCreate, ScenarioListQuery, ScenarioUpdate } from '../../shared/schemas/workspace';
import type { Page, SavedRun, ScenarioDetail, ScenarioSummary } from '../../shared/schemas/workspace-views';
import { withTransaction, type Db } from '../db/knex';
import { AppError, notFound } from '../lib/app-error';
import { inputHash } from '../lib/hash';
import { assertEditedVersion } from '../lib/version-conflict';
import { auditOf, type Actor } from '../audit/audit.repo';
import { changesOfPatch } from '../audit/changes';
import { agents } from '../agents/agents.repo';
import { workstations } from '../places/places.repo';
import { currentApproval } from '../approvals/approvals.repo';
import {
  findScenario,
  findScenarioSummary,
  insertScenario,
  listScenarios,
  scenarioLimitSource,
  softDeleteScenario,
  updateScenario,
} from './scenarios.repo';
import { findRun, listRuns } from './runs.repo';
import { assertMayMove } from './move-rule';
import { currentLimit, judgedRunFigures } from '../verdicts/run-verdict';
import { judgeOptions, withVerdict } from '../../shared/verdict/index';

const auditScenario = auditOf('scenario');

async function checkRefs(db: Db, v: { workstationId?: number; agentId?: number | null }) {
  if (v.workstationId && !(await workstations.get(db, v.workstationId)))
    throw new AppError(400, 'invalid_input', 'That workstation does not exist', [
      { path: 'body.workstationId', message: `No workstation ${v.workstationId}` },
    ]);
  if (v.agentId && !(await agents.get(db, v.agentId)))
    throw new AppError(400, 'invalid_input', 'That dust agent does not exist', [
      { path: 'body.agentId', message: `No dust agent ${v.agentId}` },
    ]);
}

// An approved option needs review once its approval expired or its scenario changed after the approved run.
export async function listScenariosForReview(db: Db, q: ScenarioListQuery): Promise<Page<ScenarioSummary>> {
  const page = await listScenarios(db, q);
  const items = await Promise.all(
    page.items.map(async (s) => ({
      ...s,
      needsReview: s.status === 'approved' ? ((await currentApproval(db, s.workstationId))?.needsReview ?? true) : false,
    })),
  );
  return { ...page, items };
}

export async function getScenario(db: Db, id: number): Promise<ScenarioDetail> {
  const found = await findScenarioSummary(db, id);
  if (!found) throw notFound('Scenario');
  const runs = await listRuns(db, id);
  const limit = currentLimit(found.agentData, found.input);
  return {
    ...found.summary,
    input: found.input,
    inputHash: found.inputHash,
    approval: await currentApproval(db, found.summary.workstationId),
    runs: runs.map(({ verdictNumbers: numbers, ...r }) => {
      const judged = judgedRunFigures({ ...r, verdict_numbers: numbers }, limit);
      const v = judged.verdict;
      return {
        ...r,
        limit_fraction: judged.limitFraction,
        twa8h_mgPerM3: judged.twa8h_mgPerM3,
        twa8h_lo_mgPerM3: judged.twa8hCi95_mgPerM3[0],
        twa8h_hi_mgPerM3: judged.twa8hCi95_mgPerM3[1],
        percent_of_limit: v?.percentOfLimit ?? null,
        rating_category: v?.ratingCategory ?? null,
        banner: v?.banner ?? null,
        decided: v?.decided ?? null,
        reasons: v?.reasons ?? [],
        outOfDate: r.input_hash !== found.inputHash,
      };
    }),
  };
}

export const scenariosService = {
  async create(db: Db, actor: Actor, input: ScenarioCreate): Promise<ScenarioDetail> {
    await checkRefs(db, input);
    const id = await withTransaction(db, async (trx) => {
      const newId = await insertScenario(trx, { ...input, inputHash: inputHash(input.input) }, actor.id);
      await auditScenario(trx, actor, 'scenario.created', newId, { name: input.name, workstationId: input.workstationId });
      return newId;
    });
    return getScenario(db, id);
  },

  async update(db: Db, actor: Actor, id: number, patch: ScenarioUpdate): Promise<ScenarioDetail> {
    await checkRefs(db, patch);
    await withTransaction(db, async (trx) => {
      const current = await findScenario(trx, id);
      if (!current) throw notFound('Scenario');
      assertEditedVersion('scenario', patch.version, current, {
        version: current.version,
        input: current.input,
        name: current.name,
        controlDescription: current.controlDescription,
      });
      assertMayMove(current, patch.workstationId);
      const { version: _edited, ...fields } = patch;
      await updateScenario(
        trx,
        id,
        { ...fields, version: current.version + 1, inputHash: patch.input === undefined ? undefined : inputHash(patch.input) },
        actor.id,
      );
      const moved = patch.workstationId !== undefined && patch.workstationId !== current.workstationId;
      await auditScenario(trx, actor, 'scenario.changed', id, {
        version: current.version + 1,
        changes: changesOfPatch(current, fields),
        ...(moved ? { workstationId: { from: current.workstationId, to: patch.workstationId } } : {}),
      });
    });
    return getScenario(db, id);
  },

  async duplicate(db: Db, actor: Actor, id: number, name?: string): Promise<ScenarioDetail> {
    const source = await getScenario(db, id);
    return this.create(db, actor, {
      workstationId: source.workstationId,
      agentId: source.agentId,
      sizeProfileId: source.sizeProfileId,
      name: name ?? `${source.name} (option)`.slice(0, 120),
      controlDescription: source.controlDescription,
      controlTier: source.controlTier as ScenarioCreate['controlTier'],
      input: source.input as ScenarioCreate['input'],
    });
  },

  async remove(db: Db, actor: Actor, id: number): Promise<void> {
    await withTransaction(db, async (trx) => {
      const current = await findScenario(trx, id);
      if (!current) throw notFound('Scenario');
      if (current.status === 'approved')
        throw new AppError(409, 'approved', 'An approved scenario cannot be deleted; approve another option first.');
      await softDeleteScenario(trx, id);
      await auditScenario(trx, actor, 'scenario.deleted', id);
    });
  },
};

export async function getRun(db: Db, runId: number): Promise<SavedRun> {
  const run = await findRun(db, runId);
  if (!run) throw notFound('Run');
  const scenario = await findScenario(db, run.scenarioId, { includeDeleted: true });
  const source = await scenarioLimitSource(db, run.scenarioId);
  const limit = currentLimit(source?.agentData ?? null, source?.scenarioInput ?? null);
  return {
    id: run.id,
    scenarioId: run.scenarioId,
    scenarioName: scenario?.name as string,
    seed: run.seed,
    engineVersion: run.engineVersion,
    particles: run.particles,
    createdAt: run.createdAt,
    outOfDate: !scenario || scenario.inputHash !== run.inputHash,
    input: run.input,
    result: withVerdict(run.result as RunResult, limit, judgeOptions(run.input)),
  };
}
