import type { z } from 'zod';
import type { roomDataSchema, siteDataSchema, workstationDataSchema } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import { jsonTable } from '../lib/json-table';

export const sites = jsonTable<z.infer<typeof siteDataSchema>>('sites');
export const rooms = jsonTable<z.infer<typeof roomDataSchema>>('rooms', { siteId: 'site_id' });
export const workstations = jsonTable<z.infer<typeof workstationDataSchema>>('workstations', { roomId: 'room_id' });

export async function operatorIds(db: Db, workstationId: number): Promise<number[]> {
  const rows = await db('workstation_operators').where({ workstation_id: workstationId }).select('person_id');
  return rows.map((r) => r.person_id as number);
}

// One tree for the workspace navigation: sites → rooms → workstations.
export async function placesTree(db: Db) {
  const [s, r, w] = await Promise.all([sites.list(db), rooms.list(db), workstations.list(db)]);
  return s.map((site) => ({
    ...site,
    rooms: r
      .filter((room) => room.siteId === site.id)
      .map((room) => ({ ...room, workstations: w.filter((ws) => ws.roomId === room.id) })),
  }));
}
