import type { Knex } from 'knex';
import { inputHash } from '../server/lib/hash';

type Json = Record<string, unknown>;
type Row = { id: number; input: string; workstation_id: number };

const ORDER = ['quiet', 'low', 'active', 'high'];
const isRecord = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);
const hoodsOf = (input: Json): Json[] => (Array.isArray(input.hoods) ? input.hoods.filter(isRecord) : []);

// The most demanding of the hoods' release types (the cautious reading), else the workstation's. Kept here
// rather than imported so this migration does what it did on the day it ran.
function toSource(input: Json, workstationRelease: string | undefined): Json {
  const fromHoods = hoodsOf(input)
    .map((h) => h.releaseType)
    .filter((r): r is string => ORDER.includes(r as string));
  const highest = fromHoods.sort((a, b) => ORDER.indexOf(b) - ORDER.indexOf(a))[0];
  const source = isRecord(input.source) ? input.source : {};
  const releaseType = source.releaseType ?? highest ?? workstationRelease;
  const hoods = Array.isArray(input.hoods)
    ? input.hoods.map((h) => (isRecord(h) ? Object.fromEntries(Object.entries(h).filter(([k]) => k !== 'releaseType')) : h))
    : input.hoods;
  // The 2.0 schema fills wallDeposition on every parse; storing it keeps a re-saved run's hash equal to its scenario's.
  const room = isRecord(input.room) ? { ...input.room, wallDeposition: input.room.wallDeposition ?? true } : input.room;
  return { ...input, room, source: releaseType ? { ...source, releaseType } : source, hoods };
}

// The 1.x schema knows neither the jet nor wall deposition; every hood gets the source's release type back.
function toHoods(input: Json): Json {
  const source = isRecord(input.source) ? input.source : {};
  const { releaseType, jet: _jet, ...rest } = source;
  const hoods = Array.isArray(input.hoods) ? input.hoods.map((h) => (isRecord(h) && releaseType ? { ...h, releaseType } : h)) : input.hoods;
  const room = isRecord(input.room) ? Object.fromEntries(Object.entries(input.room).filter(([k]) => k !== 'wallDeposition')) : input.room;
  return { ...input, room, source: rest, hoods };
}

// Scenarios and their runs are rewritten alike and re-hashed, so a run that was current stays current.
async function rewrite(knex: Knex, change: (input: Json, workstationRelease: string | undefined) => Json) {
  await knex.transaction(async (trx) => {
    const stations = await trx('workstations').select('id', 'data');
    const release = new Map<number, string | undefined>(
      stations.map((w: { id: number; data: string }) => [w.id, (JSON.parse(w.data) as Json).releaseType as string | undefined]),
    );
    const scenarios: Row[] = await trx('scenarios').select('id', 'input', 'workstation_id');
    const runs: Row[] = await trx('runs as r')
      .join('scenarios as s', 's.id', 'r.scenario_id')
      .select('r.id', 'r.input', 's.workstation_id');
    for (const [table, rows] of [
      ['scenarios', scenarios],
      ['runs', runs],
    ] as const) {
      for (const row of rows) {
        const input = change(JSON.parse(row.input) as Json, release.get(row.workstation_id));
        await trx(table)
          .where({ id: row.id })
          .update({ input: JSON.stringify(input), input_hash: inputHash(input) });
      }
    }
  });
}

export async function up(knex: Knex): Promise<void> {
  await rewrite(knex, toSource);
}

export async function down(knex: Knex): Promise<void> {
  await rewrite(knex, (input) => toHoods(input));
}
