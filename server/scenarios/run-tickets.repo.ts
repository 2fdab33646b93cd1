import type { Conn } from '../db/knex';
import type { RunTicketRow } from '../db/tables';

export type IssuedTicket = { ticket: string; scenarioId: number; seed: string; engineVersion: string; usedAt: string | null };

export async function insertTicket(
  db: Conn,
  t: { ticket: string; scenarioId: number; seed: string; engineVersion: string; issuedTo: number },
): Promise<void> {
  await db('run_tickets').insert({
    ticket: t.ticket,
    scenario_id: t.scenarioId,
    seed: t.seed,
    engine_version: t.engineVersion,
    issued_to: t.issuedTo,
    issued_at: new Date().toISOString(),
  });
}

const toIssued = (r: RunTicketRow): IssuedTicket => ({
  ticket: r.ticket,
  scenarioId: r.scenario_id,
  seed: r.seed,
  engineVersion: r.engine_version,
  usedAt: r.used_at,
});

export async function findTicket(db: Conn, ticket: string): Promise<IssuedTicket | undefined> {
  const row = await db('run_tickets').where({ ticket }).first();
  return row ? toIssued(row) : undefined;
}

/** Marks the ticket used; false when another save already did (the update is the lock). */
export async function claimTicket(db: Conn, ticket: string): Promise<boolean> {
  const n = await db('run_tickets').where({ ticket }).whereNull('used_at').update({ used_at: new Date().toISOString() });
  return n === 1;
}

export async function linkTicketToRun(db: Conn, ticket: string, runId: number): Promise<void> {
  await db('run_tickets').where({ ticket }).update({ run_id: runId });
}
