import request from 'supertest';
import type { Role } from '../../shared/auth/permissions';
import { createApp } from '../../server/app';
import { createDb, migrateLatest, type Db } from '../../server/db/knex';
import { DEMO_PEOPLE, seedDemo } from '../../server/db/seed';
import { createOutboxMailer } from '../../server/mail/mailer';

export const HOST = 'motewalk.test';
export const ORIGIN = `http://${HOST}`;

export async function createTestApp(opts: { demoWorkspace?: boolean; particles?: number } = {}) {
  const db: Db = createDb(':memory:');
  await migrateLatest(db);
  await seedDemo(db, { workspace: opts.demoWorkspace ?? false, particles: opts.particles ?? 2000 });
  const app = createApp({
    db,
    mailer: createOutboxMailer(db, 'test@motewalk.local'),
    sessionSecret: 'test-secret-0123456789',
    publicUrl: ORIGIN,
  });

  // Every request carries our own origin, as a browser on a Motewalk page would.
  const anonymous = () => request.agent(app).set('Host', HOST).set('Origin', ORIGIN);

  async function signIn(role: Role) {
    const person = DEMO_PEOPLE.find((p) => p.role === role)!;
    const agent = anonymous();
    const res = await agent.post('/api/auth/login').send({ email: person.email, password: person.password });
    if (res.status !== 200) throw new Error(`sign-in as ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
    return agent;
  }

  const personId = async (role: Role) =>
    (
      await db('people')
        .where({ email: DEMO_PEOPLE.find((p) => p.role === role)!.email })
        .first()
    ).id as number;

  return { app, db, anonymous, signIn, personId, close: () => db.destroy() };
}

export type TestApp = Awaited<ReturnType<typeof createTestApp>>;
