import type { Conn } from '../db/knex';

// connect-session-knex keeps passport's person id inside the session's JSON.
export async function endSessionsOf(db: Conn, personId: number): Promise<number> {
  return db('sessions').whereRaw("json_extract(sess, '$.passport.user') = ?", [personId]).delete();
}

// The store writes `expired` as an ISO string, so text order is time order.
export async function deleteExpiredSessions(db: Conn, now = new Date()): Promise<number> {
  return db('sessions').where('expired', '<', now.toISOString()).delete();
}
