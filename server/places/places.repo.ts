import type { z } from 'zod';
import type { roomDataSchema, siteDataSchema, workstationDataSchema } from '../../shared/schemas/workspace';
import type { SiteTree } from '../../shared/schemas/workspace-views';
import type { Conn } from '../db/knex';
import { jsonTable } from '../db/json-table';

export const sites = jsonTable<z.infer<typeof siteDataSchema>>('sites');
export const rooms = jsonTable<z.infer<typeof roomDataSchema>, 'siteId'>('rooms', { siteId: 'site_id' });
export const workstations = jsonTable<z.infer<typeof workstationDataSchema>, 'roomId'>('workstations', { roomId: 'room_id' });

export async function replaceOperators(db: Conn, workstationId: number, personIds: number[]): Promise<void> {
  await db('workstation_operators').where({ workstation_id: workstationId }).delete();
  if (personIds.length) await db('workstation_operators').insert(personIds.map((id) => ({ workstation_id: workstationId, person_id: id })));
}

export async function isOperatorOf(db: Conn, workstationId: number, personId: number): Promise<boolean> {
  return (await db('workstation_operators').where({ workstation_id: workstationId, person_id: personId }).first()) !== undefined;
}

export async function workstationIdsOfOperator(db: Conn, personId: number): Promise<number[]> {
  return (await db('workstation_operators').where({ person_id: personId }).select('workstation_id')).map((r) => r.workstation_id);
}

export async function liveWorkstationIds(db: Conn): Promise<number[]> {
  return (await db('workstations').whereNull('deleted_at').select('id')).map((r) => r.id);
}

// Deleted rows count too: the demo loads into an empty workspace only.
export async function hasAnySite(db: Conn): Promise<boolean> {
  return (await db('sites').first()) !== undefined;
}

export async function firstWorkstationId(db: Conn): Promise<number | undefined> {
  return (await db('workstations').orderBy('id').first())?.id;
}

export async function operatorIds(db: Conn, workstationId: number): Promise<number[]> {
  const rows = await db('workstation_operators').where({ workstation_id: workstationId }).select('person_id');
  return rows.map((r) => r.person_id as number);
}

// One tree for the workspace navigation: sites → rooms → workstations.
export async function placesTree(db: Conn): Promise<SiteTree[]> {
  const [s, r, w] = await Promise.all([sites.list(db), rooms.list(db), workstations.list(db)]);
  return s.map((site) => ({
    ...site,
    rooms: r.filter((room) => room.siteId === site.id).map((room) => ({ ...room, workstations: w.filter((ws) => ws.roomId === room.id) })),
  }));
}

// What still hangs below a place: live rooms of a site, live workstations of a room, live scenarios of a workstation.
export async function liveChildren(db: Conn, kind: 'site' | 'room' | 'workstation', id: number): Promise<string[]> {
  const [table, column] =
    kind === 'site'
      ? (['rooms', 'site_id'] as const)
      : kind === 'room'
        ? (['workstations', 'room_id'] as const)
        : (['scenarios', 'workstation_id'] as const);
  const rows: { name: string }[] = await db(table)
    .where({ [column]: id })
    .whereNull('deleted_at')
    .orderBy('name')
    .select('name');
  return rows.map((r) => r.name);
}
