import type { Db } from '../db/knex';
import { forbidden } from '../lib/app-error';

// Ownership policy: operators see only the boards of the workstations an admin assigned them to.
export async function assertMayReadBoard(db: Db, user: Express.User, workstationId: number): Promise<void> {
  if (user.role === 'admin') return;
  const assigned = await db('workstation_operators').where({ workstation_id: workstationId, person_id: user.id }).first();
  if (!assigned) throw forbidden();
}

export async function boardWorkstationIds(db: Db, user: Express.User): Promise<number[]> {
  if (user.role === 'admin') return (await db('workstations').whereNull('deleted_at').select('id')).map((r) => r.id);
  return (await db('workstation_operators').where({ person_id: user.id }).select('workstation_id')).map((r) => r.workstation_id);
}
