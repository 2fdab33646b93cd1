import type { Db } from '../db/knex';
import { forbidden } from '../lib/app-error';
import { isOperatorOf, liveWorkstationIds, workstationIdsOfOperator } from '../places/places.repo';

// Ownership policy: operators see only the boards of the workstations an admin assigned them to.
export async function assertMayReadBoard(db: Db, user: Express.User, workstationId: number): Promise<void> {
  if (user.role === 'admin') return;
  if (!(await isOperatorOf(db, workstationId, user.id))) throw forbidden();
}

export async function boardWorkstationIds(db: Db, user: Express.User): Promise<number[]> {
  if (user.role === 'admin') return liveWorkstationIds(db);
  return workstationIdsOfOperator(db, user.id);
}
