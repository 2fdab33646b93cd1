import type { Db } from '../db/knex';
import { writeAudit, type Actor } from '../audit/audit.repo';
import { updatePerson } from '../people/people.repo';

export async function recordFailedSignIn(db: Db, email: string): Promise<void> {
  await writeAudit(db, { actorEmail: email, action: 'auth.sign_in_failed' });
}

export async function recordSignIn(db: Db, user: Actor): Promise<void> {
  await updatePerson(db, user.id, { lastSignInAt: new Date().toISOString() });
  await writeAudit(db, { actor: user, action: 'auth.signed_in' });
}

export async function recordSignOut(db: Db, user: Actor): Promise<void> {
  await writeAudit(db, { actor: user, action: 'auth.signed_out' });
}
