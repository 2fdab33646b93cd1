import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseEnv, type Env } from './config/env';
import { resolveSessionSecret } from './config/session-secret';
import { createDb, migrateLatest } from './db/knex';
import { DEMO_PEOPLE, seedDemo } from './db/seed';
import { createOutboxMailer, createSmtpMailer } from './mail/mailer';
import { startSessionPruning } from './auth/session-lifetime';
import { createApp } from './app';

// Start-up problems end the process with one plain line and a non-zero code, never a stack trace.
function fail(message: string): never {
  console.error(`Motewalk could not start: ${message}`);
  process.exit(1);
}

let env: Env;
try {
  env = parseEnv();
} catch (err) {
  fail((err as Error).message);
}

const db = createDb(env.DATABASE_FILE);
await migrateLatest(db);
await seedDemo(db, { particles: env.DEMO_PARTICLES, log: (line) => console.log(line) });

const mailer = env.SMTP_URL ? createSmtpMailer(env.SMTP_URL, env.MAIL_FROM) : createOutboxMailer(db, env.MAIL_FROM);
const clientDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../dist');
let listeningUrl = `http://localhost:${env.PORT}`;
const app = createApp({
  db,
  mailer,
  sessionSecret: resolveSessionSecret(env.SESSION_SECRET, env.DATABASE_FILE),
  production: env.NODE_ENV === 'production',
  // Outside production the links point at this server itself, wherever it ended up listening.
  publicUrl: env.PUBLIC_URL ?? (() => listeningUrl),
  trustProxy: env.TRUST_PROXY,
  clientDir,
  logRequests: env.LOG_REQUESTS === '1',
});

const server = app.listen(env.PORT, (err?: Error) => {
  if (err) {
    const code = (err as NodeJS.ErrnoException).code;
    if (code === 'EADDRINUSE') fail(`port ${env.PORT} is already in use (set PORT to a free port)`);
    if (code === 'EACCES') fail(`no permission to listen on port ${env.PORT}`);
    fail(`cannot listen on port ${env.PORT}: ${err.message}`);
  }
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : env.PORT;
  listeningUrl = `http://localhost:${port}`;
  console.log(`Motewalk is running on ${listeningUrl}`);
  if (env.NODE_ENV === 'production' && env.TRUST_PROXY === 0)
    console.log('TRUST_PROXY is 0: X-Forwarded-* headers are ignored; set it to the number of proxies in front if TLS ends at one.');
  console.log('Demo sign-ins (local demo only):');
  for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(9)} ${p.email.padEnd(26)} ${p.password}`);
  if (!env.SMTP_URL) console.log('E-mail goes to the local outbox (admin → Outbox).');
});
const stopPruning = startSessionPruning(db);

// One failed request must never take the server down with it.
process.on('unhandledRejection', (reason) => console.error('[unhandled rejection]', reason));

let closing = false;
function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  console.log(`${signal} received: closing`);
  stopPruning();
  server.close(async () => {
    await db.destroy();
    process.exit(0);
  });
  server.closeAllConnections?.();
  setTimeout(() => process.exit(1), 5000).unref();
}
process.on('SIGTERM', () => shutdown('SIGTERM'));
process.on('SIGINT', () => shutdown('SIGINT'));
