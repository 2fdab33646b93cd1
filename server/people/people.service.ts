import type { InviteInput, Person, UpdatePersonInput } from '../../shared/schemas/auth';
import type { Page } from '../../shared/schemas/workspace-views';
import { withTransaction, type Db } from '../db/knex';
import type { Mailer } from '../mail/mailer';
import { AppError, notFound } from '../lib/app-error';
import { auditOf, type Actor } from '../audit/audit.repo';
import { hashPassword } from '../auth/password';
import { endSessionsOf } from '../auth/sessions.repo';
import { findByEmail, findPerson, insertPerson, listPeople, updatePerson, type PeopleQuery } from './people.repo';
import { findUsableToken, issueToken, markTokenUsed } from './tokens.repo';
import { passwordLinkMail } from './people.mails';

const auditPerson = auditOf('person');

export const listPeoplePage = (db: Db, q: PeopleQuery): Promise<Page<Person>> => listPeople(db, q);

export async function invitePerson(db: Db, mailer: Mailer, actor: Actor, input: InviteInput, baseUrl: string): Promise<Person> {
  const taken = await findByEmail(db, input.email);
  if (taken)
    throw new AppError(409, 'email_taken', `Someone with the e-mail ${input.email} already has an account`, [
      { path: 'body.email', message: 'Already in use' },
    ]);
  const { id, token } = await withTransaction(db, async (trx) => {
    const newId = await insertPerson(trx, { ...input, status: 'invited' });
    const t = await issueToken(trx, newId, 'invite');
    await auditPerson(trx, actor, 'person.invited', newId, { email: input.email, role: input.role });
    return { id: newId, token: t };
  });
  await sendOrExplain(
    mailer,
    passwordLinkMail('invite', input.email, input.name, `${baseUrl}/set-password?token=${token}`),
    'The account was created but the invitation e-mail could not be sent. Use "Resend invitation" once mail works.',
  );
  return (await findPerson(db, id))!;
}

export async function changePerson(db: Db, actor: Actor, id: number, patch: UpdatePersonInput): Promise<Person> {
  const person = await findPerson(db, id);
  if (!person) throw notFound('Person');
  if (id === actor.id && (patch.status === 'deactivated' || (patch.role && patch.role !== 'admin'))) {
    throw new AppError(400, 'self_lockout', 'You cannot remove your own admin access', [{ path: 'body', message: 'Ask another admin' }]);
  }
  if (patch.status === 'active' && person.status === 'invited') {
    throw new AppError(400, 'invalid_input', 'An invited person becomes active by setting a password', [
      { path: 'body.status', message: 'Send a new link instead' },
    ]);
  }
  await withTransaction(db, async (trx) => {
    await updatePerson(trx, id, patch);
    if (patch.role && patch.role !== person.role)
      await auditPerson(trx, actor, 'person.role_changed', id, { from: person.role, to: patch.role });
    if (patch.status && patch.status !== person.status)
      await auditPerson(trx, actor, patch.status === 'deactivated' ? 'person.deactivated' : 'person.reactivated', id);
  });
  return (await findPerson(db, id))!;
}

export async function sendResetLink(db: Db, mailer: Mailer, actor: Actor, id: number, baseUrl: string) {
  const person = await findPerson(db, id);
  if (!person) throw notFound('Person');
  if (person.status === 'deactivated') throw new AppError(400, 'deactivated', 'Reactivate this person before sending a link');
  const purpose = person.status === 'invited' ? 'invite' : 'reset';
  const token = await withTransaction(db, async (trx) => {
    const t = await issueToken(trx, id, purpose);
    await auditPerson(trx, actor, 'person.password_link_sent', id);
    return t;
  });
  await sendOrExplain(
    mailer,
    passwordLinkMail(purpose, person.email, person.name, `${baseUrl}/set-password?token=${token}`),
    'The link could not be e-mailed. Try again once mail works.',
  );
}

// Mail goes out after the database commit, so a mail failure must say what did and did not happen.
async function sendOrExplain(mailer: Mailer, mail: Parameters<Mailer['send']>[0], message: string) {
  try {
    await mailer.send(mail);
  } catch (err) {
    console.error('[mail] sending failed', err);
    throw new AppError(502, 'mail_failed', message);
  }
}

const unusableLink = () =>
  new AppError(400, 'invalid_token', 'This link has expired or was already used. Ask an admin for a new one.', [
    { path: 'body.token', message: 'Expired or used' },
  ]);

// The token is checked before the costly hash, so made-up tokens cost the server nothing; the
// transaction checks it again because another request may have used it meanwhile.
export async function setPasswordWithToken(db: Db, token: string, password: string) {
  if (!(await findUsableToken(db, token))) throw unusableLink();
  const passwordHash = await hashPassword(password);
  return withTransaction(db, async (trx) => {
    const found = await findUsableToken(trx, token);
    if (!found) throw unusableLink();
    const person = await findPerson(trx, found.personId);
    if (!person || person.status === 'deactivated')
      throw new AppError(400, 'invalid_token', 'This account is not active', [{ path: 'body.token', message: 'Account not active' }]);
    await updatePerson(trx, person.id, { passwordHash, status: 'active' });
    await markTokenUsed(trx, found.id);
    // Whoever knew the old password may still be signed in somewhere: a new password ends every session.
    const ended = await endSessionsOf(trx, person.id);
    await auditPerson(trx, { id: person.id, email: person.email }, 'person.password_set', person.id, { sessionsEnded: ended });
    return person.email;
  });
}
