import type { Knex } from 'knex';
import type { ScenarioListQuery } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';

type Conn = Db | Knex.Transaction;

const SORT: Record<ScenarioListQuery['sort'], string> = {
  name: 's.name',
  workstation: 'w.name',
  site: 'si.name',
  agent: 'a.name',
  status: 's.status',
  updatedAt: 's.updated_at',
  respirableTwa: 'lr.respirable_twa8h_mgPerM3',
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
  's.id', 's.name', 's.workstation_id', 's.agent_id', 's.size_profile_id', 's.control_description', 's.control_tier', 's.status', 's.version',
  's.input_hash', 's.created_at', 's.updated_at', 'w.name as workstation_name', 'r.id as room_id', 'r.name as room_name', 'si.id as site_id',
  'si.name as site_name', 'a.name as agent_name', 'lr.id as run_id', 'lr.input_hash as run_input_hash', 'lr.respirable_twa8h_mgPerM3',
  'lr.twa8h_mgPerM3', 'lr.twa8h_lo_mgPerM3', 'lr.twa8h_hi_mgPerM3', 'lr.limit_fraction', 'lr.percent_of_limit', 'lr.rating_category', 'lr.banner', 'lr.created_at as run_created_at',
];

export type ScenarioRow = Record<string, unknown> & { id: number; version: number; input_hash: string; status: string };

export function toSummary(r: ScenarioRow) {
  return {
    id: r.id,
    name: r.name as string,
    workstationId: r.workstation_id as number,
    workstationName: r.workstation_name as string,
    roomName: r.room_name as string,
    siteId: r.site_id as number,
    siteName: r.site_name as string,
    agentId: r.agent_id as number | null,
    agentName: (r.agent_name as string | null) ?? null,
    sizeProfileId: (r.size_profile_id as number | null) ?? null,
    controlDescription: r.control_description as string,
    controlTier: r.control_tier as string,
    status: r.status,
    version: r.version,
    createdAt: r.created_at as string,
    updatedAt: r.updated_at as string,
    lastRun: r.run_id
      ? {
          id: r.run_id as number,
          createdAt: r.run_created_at as string,
          outOfDate: r.run_input_hash !== r.input_hash,
          respirableTwa8h_mgPerM3: r.respirable_twa8h_mgPerM3 as number | null,
          limitFraction: r.limit_fraction as string | null,
          twa8h_mgPerM3: r.twa8h_mgPerM3 as number | null,
          twa8hCi95_mgPerM3: [r.twa8h_lo_mgPerM3, r.twa8h_hi_mgPerM3] as [number | null, number | null],
          percentOfLimit: r.percent_of_limit as number | null,
          ratingCategory: r.rating_category as number | null,
          banner: r.banner as 'clear' | 'watch' | 'act' | null,
        }
      : null,
  };
}
export type ScenarioSummary = ReturnType<typeof toSummary>;

export async function listScenarios(db: Db, q: ScenarioListQuery) {
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
  return { items: (rows as ScenarioRow[]).map(toSummary), total: Number(count), page: q.page, pageSize: q.pageSize };
}

export async function getScenarioRow(db: Conn, id: number) {
  return (await baseQuery(db).where('s.id', id).select([...COLUMNS, 's.input']).first()) as (ScenarioRow & { input: string }) | undefined;
}

export async function listRuns(db: Conn, scenarioId: number) {
  return db('runs')
    .where({ scenario_id: scenarioId })
    .whereNull('deleted_at')
    .orderBy('id', 'desc')
    .select('id', 'seed', 'engine_version', 'input_hash', 'particles', 'limit_fraction', 'twa8h_mgPerM3', 'twa8h_lo_mgPerM3', 'twa8h_hi_mgPerM3', 'respirable_twa8h_mgPerM3', 'percent_of_limit', 'rating_category', 'banner', 'created_by', 'created_at');
}
