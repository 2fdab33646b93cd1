import type { RoomInput, SiteInput, WorkstationInput } from '../../shared/schemas/workspace';
import type { RoomRecord, SiteRecord, SiteTree, WorkstationDetail, WorkstationRecord } from '../../shared/schemas/workspace-views';
import { withTransaction, type Db } from '../db/knex';
import { AppError, notFound } from '../lib/app-error';
import { auditOf, type Actor } from '../audit/audit.repo';
import { changesOf } from '../audit/changes';
import { currentApproval } from '../approvals/approvals.repo';
import { operatorIds, placesTree, rooms, sites, workstations } from './places.repo';

const auditSite = auditOf('site');
const auditRoom = auditOf('room');
const auditWorkstation = auditOf('workstation');

async function insideRoom(db: Db, roomId: number, data: WorkstationInput['data']) {
  const room = await rooms.get(db, roomId);
  if (!room) throw new AppError(400, 'invalid_input', 'That room does not exist', [{ path: 'body.roomId', message: `No room ${roomId}` }]);
  const issues = [];
  for (const [part, point] of [
    ['source', data.source],
    ['worker', data.worker],
  ] as const) {
    if (point.x_m > room.data.length_m)
      issues.push({ path: `body.data.${part}.x_m`, message: `Must be within the room length (${room.data.length_m} m), got ${point.x_m}` });
    if (point.y_m > room.data.width_m)
      issues.push({ path: `body.data.${part}.y_m`, message: `Must be within the room width (${room.data.width_m} m), got ${point.y_m}` });
    if (point.z_m > room.data.height_m)
      issues.push({ path: `body.data.${part}.z_m`, message: `Must be below the ceiling (${room.data.height_m} m), got ${point.z_m}` });
  }
  if (issues.length) throw new AppError(400, 'invalid_input', 'The workstation does not fit in its room', issues);
}

export const placesService = {
  tree(db: Db): Promise<SiteTree[]> {
    return placesTree(db);
  },
  async getWorkstation(db: Db, id: number): Promise<WorkstationDetail> {
    const ws = await workstations.get(db, id);
    if (!ws) throw notFound('Workstation');
    const room = (await rooms.get(db, ws.roomId))!;
    return { ...ws, room, approval: await currentApproval(db, ws.id), operatorIds: await operatorIds(db, ws.id) };
  },
  async createSite(db: Db, actor: Actor, input: SiteInput): Promise<SiteRecord> {
    return withTransaction(db, async (trx) => {
      const id = await sites.insert(trx, { ...input, createdBy: actor.id });
      await auditSite(trx, actor, 'site.created', id, { name: input.name });
      return (await sites.get(trx, id))!;
    });
  },
  async createRoom(db: Db, actor: Actor, input: RoomInput): Promise<RoomRecord> {
    if (!(await sites.get(db, input.siteId)))
      throw new AppError(400, 'invalid_input', 'That site does not exist', [{ path: 'body.siteId', message: `No site ${input.siteId}` }]);
    return withTransaction(db, async (trx) => {
      const id = await rooms.insert(trx, { ...input, createdBy: actor.id });
      await auditRoom(trx, actor, 'room.created', id, { name: input.name });
      return (await rooms.get(trx, id))!;
    });
  },
  async createWorkstation(db: Db, actor: Actor, input: WorkstationInput): Promise<WorkstationRecord> {
    await insideRoom(db, input.roomId, input.data);
    return withTransaction(db, async (trx) => {
      const id = await workstations.insert(trx, { ...input, createdBy: actor.id });
      await auditWorkstation(trx, actor, 'workstation.created', id, { name: input.name });
      return (await workstations.get(trx, id))!;
    });
  },
  async updateWorkstation(db: Db, actor: Actor, id: number, input: Pick<WorkstationInput, 'name' | 'data'>): Promise<WorkstationRecord> {
    const current = await workstations.get(db, id);
    if (!current) throw notFound('Workstation');
    await insideRoom(db, current.roomId, input.data);
    return withTransaction(db, async (trx) => {
      await workstations.update(trx, id, input);
      await auditWorkstation(trx, actor, 'workstation.changed', id, {
        changes: changesOf({ name: current.name, ...current.data }, { name: input.name, ...input.data }),
      });
      return (await workstations.get(trx, id))!;
    });
  },
};
