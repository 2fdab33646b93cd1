import type { RoomInput, RoomUpdate, SiteInput, SiteUpdate, WorkstationInput, WorkstationUpdate } from '../../shared/schemas/workspace';
import type { RoomRecord, SiteRecord, SiteTree, WorkstationDetail, WorkstationRecord } from '../../shared/schemas/workspace-views';
import { withTransaction, type Conn, type Db } from '../db/knex';
import { AppError, notFound } from '../lib/app-error';
import { editAtVersion, type VersionedTable } from '../lib/version-conflict';
import { auditOf, type Actor } from '../audit/audit.repo';
import { changesOf } from '../audit/changes';
import { currentApproval } from '../approvals/approvals.repo';
import { liveChildren, operatorIds, placesTree, rooms, sites, workstations } from './places.repo';
import { pointsOutsideRoom } from './place-fit';

const auditSite = auditOf('site');
const auditRoom = auditOf('room');
const auditWorkstation = auditOf('workstation');

async function insideRoom(db: Conn, roomId: number, data: WorkstationInput['data']) {
  const room = await rooms.get(db, roomId);
  if (!room) throw new AppError(400, 'invalid_input', 'That room does not exist', [{ path: 'body.roomId', message: `No room ${roomId}` }]);
  const issues = pointsOutsideRoom(room.data, data);
  if (issues.length) throw new AppError(400, 'invalid_input', 'The workstation does not fit in its room', issues);
}

const DIMENSION = { x_m: 'length_m', y_m: 'width_m', z_m: 'height_m' } as const;

// A room cannot shrink around a workstation drawn in it: each one left outside is named on the dimension.
async function roomStillHoldsWorkstations(db: Conn, roomId: number, data: RoomUpdate['data']) {
  const inside = await workstations.list(db, { room_id: roomId });
  const issues = inside.flatMap((w) =>
    pointsOutsideRoom(data, w.data).map((i) => {
      const [, part, axis] = i.path.slice('body.'.length).split('.') as [string, string, keyof typeof DIMENSION];
      return {
        path: `body.data.${DIMENSION[axis]}`,
        message: `${w.name}: the ${part === 'worker' ? 'worker' : 'source'} ${i.message.toLowerCase()}`,
      };
    }),
  );
  if (issues.length) throw new AppError(400, 'invalid_input', 'A workstation in this room would lie outside it', issues);
}

const edited = (r: { name: string; data: object }) => ({ name: r.name, data: r.data });

/** One edit of a place at the version the editor read, audited with what changed (from → to). */
async function editAudited<R extends { version: number; name: string; data: object }, P>(
  trx: Conn,
  actor: Actor,
  kind: 'site' | 'room' | 'workstation',
  table: VersionedTable<R, P>,
  id: number,
  version: number,
  patch: P,
): Promise<R> {
  const { before, after } = await editAtVersion(trx, table, kind, id, version, patch);
  await auditOf(kind)(trx, actor, `${kind}.changed`, id, {
    name: after.name,
    version: after.version,
    changes: changesOf(edited(before), edited(after)),
  });
  return after;
}

const CHILD: Record<'site' | 'room' | 'workstation', [string, string]> = {
  site: ['room', 'rooms'],
  room: ['workstation', 'workstations'],
  workstation: ['scenario', 'scenarios'],
};

// Deleting is refused while anything live hangs below the place (see places.routes.ts for why).
async function assertEmpty(db: Conn, kind: 'site' | 'room' | 'workstation', id: number, name: string) {
  const names = await liveChildren(db, kind, id);
  if (!names.length) return;
  const [one, many] = CHILD[kind];
  const listed = names.slice(0, 5).join(', ') + (names.length > 5 ? ', …' : '');
  throw new AppError(
    409,
    'not_empty',
    `“${name}” still has ${names.length} ${names.length === 1 ? one : many} (${listed}). Delete or move ${names.length === 1 ? 'it' : 'them'} first.`,
    undefined,
    { children: names },
  );
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
  async updateSite(db: Db, actor: Actor, id: number, { version, ...patch }: SiteUpdate): Promise<SiteRecord> {
    return withTransaction(db, (trx) => editAudited(trx, actor, 'site', sites, id, version, patch));
  },
  async updateRoom(db: Db, actor: Actor, id: number, { version, ...patch }: RoomUpdate): Promise<RoomRecord> {
    return withTransaction(db, async (trx) => {
      if (await rooms.get(trx, id)) await roomStillHoldsWorkstations(trx, id, patch.data);
      return editAudited(trx, actor, 'room', rooms, id, version, patch);
    });
  },
  async updateWorkstation(db: Db, actor: Actor, id: number, { version, ...patch }: WorkstationUpdate): Promise<WorkstationRecord> {
    return withTransaction(db, async (trx) => {
      const current = await workstations.get(trx, id);
      if (current) await insideRoom(trx, current.roomId, patch.data);
      return editAudited(trx, actor, 'workstation', workstations, id, version, patch);
    });
  },
  async remove(db: Db, actor: Actor, kind: 'site' | 'room' | 'workstation', id: number): Promise<void> {
    const table = { site: sites, room: rooms, workstation: workstations }[kind];
    await withTransaction(db, async (trx) => {
      const current = await table.get(trx, id);
      if (!current) throw notFound(kind.charAt(0).toUpperCase() + kind.slice(1));
      await assertEmpty(trx, kind, id, current.name);
      await table.softDelete(trx, id);
      await auditOf(kind)(trx, actor, `${kind}.deleted`, id, { name: current.name });
    });
  },
};
