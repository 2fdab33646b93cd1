import type { Scenario } from '../../shared/schemas/scenario';
import type { ControlTier, ScenarioListQuery } from '../../shared/schemas/workspace';
import type { Page, ScenarioSummary } from '../../shared/schemas/workspace-views';
import type { Conn } from '../db/knex';
import type { RunRow, ScenarioRow } from '../db/tables';
import { currentLimit, judgedRunFigures } from '../verdicts/run-verdict';

const SORT: Record<ScenarioListQuery['sort'], string> = {
  name: 's.name',
  workstation: 'w.name',
  site: 'si.name',
  agent: 'a.name',
  status: 's.status',
  updatedAt: 's.updated_at',
  respirableTwa: 'lr.respirable_twa8h_mgPerM3',
  // The TWA of the fraction the limit was judged on when the run was saved.
  twa: 'lr.twa8h_mgPerM3',
  percentOfLimit: 'lr.percent_of_limit',
  banner: 'lr.banner',
};

function baseQuery(db: Conn) {
  return db('scenarios as s')
    .join('workstations as w', 'w.id', 's.workstation_id')
    .join('rooms as r', 'r.id', 'w.room_id')
    .join('sites as si', 'si.id', 'r.site_id')
    .leftJoin('dust_agents as a', 'a.id', 's.agent_id')
    .leftJoin('runs as lr', function latestRun() {
      this.on('lr.id', '=', db.raw('(select max(r2.id) from runs r2 where r2.scenario_id = s.id and r2.deleted_at is null)'));
    })
    .whereNull('s.deleted_at');
}

const COLUMNS = [
  's.id',
  's.name',
  's.workstation_id',
  's.agent_id',
  's.size_profile_id',
  's.control_description',
  's.control_tier',
  's.status',
  's.version',
  's.input_hash',
  's.created_at',
  's.updated_at',
  'w.name as workstation_name',
  'r.id as room_id',
  'r.name as room_name',
  'si.id as site_id',
  'si.name as site_name',
  'a.name as agent_name',
  'lr.id as run_id',
  'lr.input_hash as run_input_hash',
  'lr.respirable_twa8h_mgPerM3',
  'lr.twa8h_mgPerM3',
  'lr.twa8h_lo_mgPerM3',
  'lr.twa8h_hi_mgPerM3',
  'lr.limit_fraction',
  'lr.percent_of_limit',
  'lr.rating_category',
  'lr.banner',
  'lr.created_at as run_created_at',
  'lr.verdict_numbers',
  'a.data as agent_data',
  's.input as scenario_input',
];

type JoinedRow = ScenarioRow & {
  workstation_name: string;
  room_id: number;
  room_name: string;
  site_id: number;
  site_name: string;
  agent_name: string | null;
  run_id: number | null;
  run_input_hash: string | null;
  run_created_at: string | null;
  agent_data: string | null;
  scenario_input: string;
} & Pick<
    RunRow,
    | 'respirable_twa8h_mgPerM3'
    | 'twa8h_mgPerM3'
    | 'twa8h_lo_mgPerM3'
    | 'twa8h_hi_mgPerM3'
    | 'limit_fraction'
    | 'percent_of_limit'
    | 'rating_category'
    | 'banner'
    | 'verdict_numbers'
  >;

// The banner, percentage and rating are judged on every read against the agent's current limit.
function toSummary(r: JoinedRow): ScenarioSummary {
  const judged = r.run_id ? judgedRunFigures(r, currentLimit(r.agent_data, r.scenario_input)) : null;
  const v = judged?.verdict ?? null;
  return {
    id: r.id,
    name: r.name,
    workstationId: r.workstation_id,
    workstationName: r.workstation_name,
    roomName: r.room_name,
    siteId: r.site_id,
    siteName: r.site_name,
    agentId: r.agent_id,
    agentName: r.agent_name ?? null,
    sizeProfileId: r.size_profile_id ?? null,
    controlDescription: r.control_description,
    controlTier: r.control_tier,
    status: r.status as ScenarioSummary['status'],
    version: r.version,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
    lastRun: r.run_id
      ? {
          id: r.run_id,
          createdAt: r.run_created_at as string,
          outOfDate: r.run_input_hash !== r.input_hash,
          respirableTwa8h_mgPerM3: r.respirable_twa8h_mgPerM3,
          limitFraction: judged!.limitFraction,
          twa8h_mgPerM3: judged!.twa8h_mgPerM3,
          twa8hCi95_mgPerM3: judged!.twa8hCi95_mgPerM3,
          percentOfLimit: v?.percentOfLimit ?? null,
          ratingCategory: v?.ratingCategory ?? null,
          banner: v?.banner ?? null,
          decided: v?.decided ?? null,
          reasons: v?.reasons ?? [],
        }
      : null,
  };
}

export async function listScenarios(db: Conn, q: ScenarioListQuery): Promise<Page<ScenarioSummary>> {
  const filtered = baseQuery(db).modify((b) => {
    if (q.siteId) b.where('si.id', q.siteId);
    if (q.workstationId) b.where('w.id', q.workstationId);
    if (q.agentId) b.where('s.agent_id', q.agentId);
    if (q.status) b.where('s.status', q.status);
    if (q.q) b.whereLike('s.name', `%${q.q.replace(/[%_]/g, '')}%`);
  });
  const [{ count }] = await filtered.clone().count<{ count: number }[]>({ count: 's.id' });
  const rows = await filtered
    .clone()
    .select(COLUMNS)
    .orderByRaw(`${SORT[q.sort]} is null`)
    .orderBy(SORT[q.sort], q.order)
    .orderBy('s.id')
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  return { items: (rows as JoinedRow[]).map(toSummary), total: Number(count), page: q.page, pageSize: q.pageSize };
}

export async function findScenarioSummary(
  db: Conn,
  id: number,
): Promise<{ summary: ScenarioSummary; input: Scenario; inputHash: string; agentData: string | null } | undefined> {
  const row = (await baseQuery(db)
    .where('s.id', id)
    .select([...COLUMNS, 's.input'])
    .first()) as JoinedRow | undefined;
  return row ? { summary: toSummary(row), input: JSON.parse(row.input), inputHash: row.input_hash, agentData: row.agent_data } : undefined;
}

export type StoredScenario = {
  id: number;
  workstationId: number;
  agentId: number | null;
  name: string;
  controlDescription: string;
  status: ScenarioSummary['status'];
  version: number;
  input: Scenario;
  inputHash: string;
};

const toStored = (r: ScenarioRow): StoredScenario => ({
  id: r.id,
  workstationId: r.workstation_id,
  agentId: r.agent_id,
  name: r.name,
  controlDescription: r.control_description,
  status: r.status as StoredScenario['status'],
  version: r.version,
  input: JSON.parse(r.input),
  inputHash: r.input_hash,
});

// Boards and saved runs still name a scenario after it was deleted; everything else sees live ones only.
export async function findScenario(db: Conn, id: number, opts: { includeDeleted?: boolean } = {}): Promise<StoredScenario | undefined> {
  const row = await db('scenarios')
    .where({ id })
    .modify((b) => {
      if (!opts.includeDeleted) b.whereNull('deleted_at');
    })
    .first();
  return row ? toStored(row) : undefined;
}

export type ScenarioFields = {
  workstationId: number;
  agentId: number | null;
  sizeProfileId: number | null;
  name: string;
  controlDescription: string;
  controlTier: ControlTier;
  input: unknown;
  inputHash: string;
};

export async function insertScenario(db: Conn, values: ScenarioFields, actorId: number): Promise<number> {
  const now = new Date().toISOString();
  const [row] = await db('scenarios')
    .insert({
      workstation_id: values.workstationId,
      agent_id: values.agentId,
      size_profile_id: values.sizeProfileId,
      name: values.name,
      control_description: values.controlDescription,
      control_tier: values.controlTier,
      input: JSON.stringify(values.input),
      input_hash: values.inputHash,
      created_by: actorId,
      updated_by: actorId,
      created_at: now,
      updated_at: now,
    })
    .returning('id');
  return typeof row === 'object' ? row.id : row;
}

export async function updateScenario(
  db: Conn,
  id: number,
  patch: Partial<ScenarioFields> & { version: number },
  actorId: number,
): Promise<void> {
  const cols: Partial<ScenarioRow> = { version: patch.version, updated_by: actorId, updated_at: new Date().toISOString() };
  if (patch.name !== undefined) cols.name = patch.name;
  if (patch.workstationId !== undefined) cols.workstation_id = patch.workstationId;
  if (patch.agentId !== undefined) cols.agent_id = patch.agentId;
  if (patch.sizeProfileId !== undefined) cols.size_profile_id = patch.sizeProfileId;
  if (patch.controlDescription !== undefined) cols.control_description = patch.controlDescription;
  if (patch.controlTier !== undefined) cols.control_tier = patch.controlTier;
  if (patch.input !== undefined) cols.input = JSON.stringify(patch.input);
  if (patch.inputHash !== undefined) cols.input_hash = patch.inputHash;
  await db('scenarios').where({ id }).update(cols);
}

export async function softDeleteScenario(db: Conn, id: number): Promise<void> {
  await db('scenarios').where({ id }).update({ deleted_at: new Date().toISOString() });
}

// One approved option per workstation: approving one returns the others to draft.
export async function markApproved(db: Conn, id: number, workstationId: number): Promise<void> {
  await db('scenarios').where({ workstation_id: workstationId, status: 'approved' }).update({ status: 'draft' });
  await db('scenarios').where({ id }).update({ status: 'approved' });
}

/** What the current limit of a scenario's runs is read from: its agent's data and its own input. */
export async function scenarioLimitSource(
  db: Conn,
  scenarioId: number,
): Promise<{ agentData: string | null; scenarioInput: string } | undefined> {
  const row = (await db('scenarios as s')
    .leftJoin('dust_agents as a', 'a.id', 's.agent_id')
    .where('s.id', scenarioId)
    .select('a.data as agent_data', 's.input as scenario_input')
    .first()) as { agent_data: string | null; scenario_input: string } | undefined;
  return row ? { agentData: row.agent_data, scenarioInput: row.scenario_input } : undefined;
}
