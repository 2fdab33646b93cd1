import { createHash, randomBytes } from 'node:crypto';
import type { Conn } from '../db/knex';

export const TOKEN_LIFETIME_MS = 72 * 3600 * 1000;

const digest = (token: string) => createHash('sha256').update(token).digest('hex');

// Only the hash is stored: a leaked database does not leak working links.
export async function issueToken(db: Conn, personId: number, purpose: 'invite' | 'reset', now = Date.now()): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  await db('password_tokens')
    .where({ person_id: personId })
    .whereNull('used_at')
    .update({ used_at: new Date(now).toISOString() });
  await db('password_tokens').insert({
    person_id: personId,
    token_hash: digest(token),
    purpose,
    expires_at: new Date(now + TOKEN_LIFETIME_MS).toISOString(),
    created_at: new Date(now).toISOString(),
  });
  return token;
}

export async function findUsableToken(
  db: Conn,
  token: string,
  now = Date.now(),
): Promise<{ id: number; personId: number; purpose: 'invite' | 'reset' } | undefined> {
  const row = await db('password_tokens')
    .where({ token_hash: digest(token) })
    .whereNull('used_at')
    .first();
  if (!row || Date.parse(row.expires_at) <= now) return undefined;
  return { id: row.id, personId: row.person_id, purpose: row.purpose as 'invite' | 'reset' };
}

export async function markTokenUsed(db: Conn, id: number): Promise<void> {
  await db('password_tokens').where({ id }).update({ used_at: new Date().toISOString() });
}
