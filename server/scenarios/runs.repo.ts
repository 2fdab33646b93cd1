import type { Scenario } from '../../shared/schemas/scenario';
import type { Banner, RunListItem } from '../../shared/schemas/workspace-views';
import type { Conn } from '../db/knex';
import type { RunRow } from '../db/tables';
import type { VerdictNumbers } from '../verdicts/verdict-numbers';
import { unpackResult } from './stored-result';

export type NewRun = {
  scenarioId: number;
  seed: string;
  engineVersion: string;
  inputHash: string;
  particles: number;
  limitFraction: string | null;
  twa8h_mgPerM3: number | null;
  twa8hCi95_mgPerM3: [number | null, number | null];
  respirableTwa8h_mgPerM3: number | null;
  percentOfLimit: number | null;
  ratingCategory: number | null;
  banner: Banner | null;
  verdictNumbers: VerdictNumbers;
  input: unknown;
  /** The result's JSON, gzip-compressed (stored-result.ts). */
  resultGz: Buffer;
  createdBy: number;
};

export type StoredRun = {
  id: number;
  scenarioId: number;
  seed: string;
  engineVersion: string;
  inputHash: string;
  particles: number;
  banner: Banner | null;
  verdictNumbers: string | null;
  createdAt: string;
};
export type StoredRunWithData = StoredRun & { input: Scenario; result: unknown };

const toStored = (r: RunRow): StoredRun => ({
  id: r.id,
  scenarioId: r.scenario_id,
  seed: r.seed,
  engineVersion: r.engine_version,
  inputHash: r.input_hash,
  particles: r.particles,
  banner: r.banner as Banner | null,
  verdictNumbers: r.verdict_numbers,
  createdAt: r.created_at,
});

export async function insertRun(db: Conn, run: NewRun): Promise<number> {
  const [row] = await db('runs')
    .insert({
      scenario_id: run.scenarioId,
      seed: run.seed,
      engine_version: run.engineVersion,
      input_hash: run.inputHash,
      particles: run.particles,
      limit_fraction: run.limitFraction,
      twa8h_mgPerM3: run.twa8h_mgPerM3,
      twa8h_lo_mgPerM3: run.twa8hCi95_mgPerM3[0],
      twa8h_hi_mgPerM3: run.twa8hCi95_mgPerM3[1],
      respirable_twa8h_mgPerM3: run.respirableTwa8h_mgPerM3,
      percent_of_limit: run.percentOfLimit,
      rating_category: run.ratingCategory,
      banner: run.banner,
      verdict_numbers: JSON.stringify(run.verdictNumbers),
      input: JSON.stringify(run.input),
      result: '',
      result_gz: run.resultGz,
      created_by: run.createdBy,
      created_at: new Date().toISOString(),
    })
    .returning('id');
  return typeof row === 'object' ? row.id : row;
}

export async function findRun(db: Conn, id: number): Promise<StoredRunWithData | undefined> {
  const row = await db('runs').where({ id }).whereNull('deleted_at').first();
  return row ? { ...toStored(row), input: JSON.parse(row.input), result: unpackResult(row) } : undefined;
}

// Sharing names any run the scenario ever had; approving needs one that is still live.
export async function findRunOfScenario(
  db: Conn,
  id: number,
  scenarioId: number,
  opts: { includeDeleted?: boolean } = {},
): Promise<StoredRun | undefined> {
  const row = await db('runs')
    .where({ id, scenario_id: scenarioId })
    .modify((b) => {
      if (!opts.includeDeleted) b.whereNull('deleted_at');
    })
    .first();
  return row ? toStored(row) : undefined;
}

// The stored banner columns are only what the run was saved with; the service judges the list afresh.
export type RunListRow = Omit<RunListItem, 'outOfDate' | 'decided' | 'reasons'> & { verdictNumbers: string | null };

export async function listRuns(db: Conn, scenarioId: number): Promise<RunListRow[]> {
  const rows = await db('runs')
    .where({ scenario_id: scenarioId })
    .whereNull('deleted_at')
    .orderBy('id', 'desc')
    .select(
      'id',
      'seed',
      'engine_version',
      'input_hash',
      'particles',
      'limit_fraction',
      'twa8h_mgPerM3',
      'twa8h_lo_mgPerM3',
      'twa8h_hi_mgPerM3',
      'respirable_twa8h_mgPerM3',
      'percent_of_limit',
      'rating_category',
      'banner',
      'verdict_numbers',
      'created_by',
      'created_at',
    );
  return rows.map(({ verdict_numbers, ...r }) => ({ ...r, banner: r.banner as Banner | null, verdictNumbers: verdict_numbers }));
}

/** Every live run of the scenarios that use a dust agent, with what a verdict needs. */
export async function runsOfAgent(db: Conn, agentId: number): Promise<{ id: number; scenarioId: number; verdictNumbers: string | null }[]> {
  const rows: Pick<RunRow, 'id' | 'scenario_id' | 'verdict_numbers'>[] = await db('runs as r')
    .join('scenarios as s', 's.id', 'r.scenario_id')
    .where('s.agent_id', agentId)
    .whereNull('r.deleted_at')
    .whereNull('s.deleted_at')
    .select('r.id', 'r.scenario_id', 'r.verdict_numbers');
  return rows.map((r) => ({ id: r.id, scenarioId: r.scenario_id, verdictNumbers: r.verdict_numbers }));
}

export type RunVerdictColumns = {
  limitFraction: string | null;
  percentOfLimit: number | null;
  ratingCategory: number | null;
  banner: Banner | null;
};

export async function updateRunVerdict(db: Conn, runId: number, v: RunVerdictColumns): Promise<void> {
  await db('runs')
    .where({ id: runId })
    .update({ limit_fraction: v.limitFraction, percent_of_limit: v.percentOfLimit, rating_category: v.ratingCategory, banner: v.banner });
}
