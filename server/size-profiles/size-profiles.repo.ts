import type { SizeProfileDetail, SizeProfileListQuery, SizeProfileSummary } from '../../shared/schemas/size-profiles';
import { toScenarioSizeProfile, type ProfileData, type ProfileKind } from '../../shared/size-profiles/index';
import type { Conn, Db } from '../db/knex';
import type { SizeProfileRow } from '../db/tables';

type Row = SizeProfileRow & { kind: ProfileKind; created_by_name: string | null };

const SUMMARY_COLUMNS = [
  'sp.id',
  'sp.name',
  'sp.kind',
  'sp.fitted_mmad_m',
  'sp.fitted_gsd',
  'sp.respirable_fraction',
  'sp.thoracic_fraction',
  'sp.inhalable_fraction',
  'sp.created_by',
  'sp.created_at',
  'p.name as created_by_name',
];

const SORT_COLUMNS: Record<SizeProfileListQuery['sort'], string> = {
  name: 'sp.name',
  kind: 'sp.kind',
  fittedMmad_m: 'sp.fitted_mmad_m',
  fittedGsd: 'sp.fitted_gsd',
  respirableFraction: 'sp.respirable_fraction',
  createdAt: 'sp.created_at',
};

const toSummary = (r: Row): SizeProfileSummary => ({
  id: r.id,
  name: r.name,
  kind: r.kind,
  fittedMmad_m: r.fitted_mmad_m,
  fittedGsd: r.fitted_gsd,
  respirableFraction: r.respirable_fraction,
  thoracicFraction: r.thoracic_fraction,
  inhalableFraction: r.inhalable_fraction,
  createdBy: r.created_by === null ? null : { id: r.created_by, name: r.created_by_name ?? '' },
  createdAt: r.created_at,
});

const live = (db: Conn) => db('size_profiles as sp').leftJoin('people as p', 'p.id', 'sp.created_by').whereNull('sp.deleted_at');

export async function listSizeProfiles(db: Db, q: SizeProfileListQuery) {
  const [{ count }] = await db('size_profiles').whereNull('deleted_at').count<{ count: number }[]>({ count: '*' });
  const rows = await live(db)
    .select<Row[]>(SUMMARY_COLUMNS)
    .orderBy(SORT_COLUMNS[q.sort], q.order)
    .orderBy('sp.id', q.order)
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  return { items: rows.map(toSummary), total: Number(count), page: q.page, pageSize: q.pageSize };
}

export async function findSizeProfile(db: Conn, id: number): Promise<SizeProfileDetail | undefined> {
  const row = await live(db)
    .where('sp.id', id)
    .first<Row | undefined>([...SUMMARY_COLUMNS, 'sp.input', 'sp.bins']);
  if (!row) return undefined;
  const summary = toSummary(row);
  const bins = JSON.parse(row.bins);
  return {
    ...summary,
    input: JSON.parse(row.input),
    bins,
    sizeProfile: toScenarioSizeProfile({ kind: row.kind, bins, fittedMmad_m: row.fitted_mmad_m, fittedGsd: row.fitted_gsd }),
  };
}

export async function insertSizeProfile(db: Conn, name: string, data: ProfileData, createdBy: number): Promise<number> {
  const [row] = await db('size_profiles')
    .insert({
      name,
      kind: data.kind,
      input: JSON.stringify(data.input),
      bins: JSON.stringify(data.bins),
      fitted_mmad_m: data.fittedMmad_m,
      fitted_gsd: data.fittedGsd,
      respirable_fraction: data.fractions.respirable,
      thoracic_fraction: data.fractions.thoracic,
      inhalable_fraction: data.fractions.inhalable,
      created_by: createdBy,
      created_at: new Date().toISOString(),
    })
    .returning('id');
  return typeof row === 'object' ? row.id : row;
}

export async function softDeleteSizeProfile(db: Conn, id: number): Promise<boolean> {
  const changed = await db('size_profiles').where({ id }).whereNull('deleted_at').update({ deleted_at: new Date().toISOString() });
  return changed > 0;
}
