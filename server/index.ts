import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseEnv } from './config/env';
import { resolveSessionSecret } from './config/session-secret';
import { createDb, migrateLatest } from './db/knex';
import { DEMO_PEOPLE, seedDemo } from './db/seed';
import { createOutboxMailer, createSmtpMailer } from './mail/mailer';
import { createApp } from './app';

const env = parseEnv();
const db = createDb(env.DATABASE_FILE);
await migrateLatest(db);
await seedDemo(db, { particles: env.DEMO_PARTICLES, log: (line) => console.log(line) });

const mailer = env.SMTP_URL ? createSmtpMailer(env.SMTP_URL, env.MAIL_FROM) : createOutboxMailer(db, env.MAIL_FROM);
const clientDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../dist');
const app = createApp({
  db,
  mailer,
  sessionSecret: resolveSessionSecret(env.SESSION_SECRET, env.DATABASE_FILE),
  production: env.NODE_ENV === 'production',
  publicUrl: env.PUBLIC_URL,
  clientDir,
  logRequests: env.LOG_REQUESTS === '1',
});

const server = app.listen(env.PORT, () => {
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : env.PORT;
  console.log(`Motewalk is running on http://localhost:${port}`);
  console.log('Demo sign-ins (local demo only):');
  for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(9)} ${p.email.padEnd(26)} ${p.password}`);
  if (!env.SMTP_URL) console.log('E-mail goes to the local outbox (admin → Outbox).');
});

// One failed request must never take the server down with it.
process.on('unhandledRejection', (reason) => console.error('[unhandled rejection]', reason));

let closing = false;
function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  console.log(`${signal} received: closing`);
  server.close(async () => {
    await db.destroy();
    process.exit(0);
  });
  server.closeAllConnections?.();
  setTimeout(() => process.exit(1), 5000).unref();
}
process.on('SIGTERM', () => shutdown('SIGTERM'));
process.on('SIGINT', () => shutdown('SIGINT'));
