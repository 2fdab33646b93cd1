import fs from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import type { Db } from './db/knex';
import type { Mailer } from './mail/mailer';
import { configurePassport } from './auth/passport';
import { SessionStore } from './auth/session-store';
import { absoluteLifetime, SESSION_IDLE_MS } from './auth/session-lifetime';
import type { DelayPolicy } from './auth/account-delay';
import type { PublicUrl } from './lib/base-url';
import { jsonBody } from './middleware/json-body';
import { authRoutes } from './auth/auth.routes';
import { peopleRoutes } from './people/people.routes';
import { outboxRoutes } from './mail/outbox.routes';
import { auditRoutes } from './audit/audit.routes';
import { placesRoutes } from './places/places.routes';
import { agentsRoutes } from './agents/agents.routes';
import { runsRoutes, scenariosRoutes } from './scenarios/scenarios.routes';
import { decisionsRoutes } from './approvals/decisions.routes';
import { boardsRoutes } from './boards/boards.routes';
import { sizeProfileRoutes } from './size-profiles/size-profiles.routes';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { requestLog } from './middleware/request-log';
import { sameOriginWrites } from './middleware/same-origin';

const RUN_UPLOAD = /^\/api\/scenarios\/\d+\/runs$/;

export type AppOptions = {
  db: Db;
  mailer: Mailer;
  sessionSecret: string;
  production?: boolean;
  /** Base of every e-mailed link; a function when only known once the server listens. */
  publicUrl: PublicUrl;
  /** Reverse-proxy hops whose X-Forwarded-* headers are believed (0: none, the default). */
  trustProxy?: number;
  loginDelay?: DelayPolicy;
  clientDir?: string;
  logRequests?: boolean;
};

export function createApp(opts: AppOptions): Express {
  const { db, mailer } = opts;
  const app = express();
  app.disable('x-powered-by');
  // Only an operator knows whether a proxy sits in front; believing forwarded headers without one
  // would let any caller pick the address the rate limits count.
  app.set('trust proxy', opts.trustProxy ?? 0);
  app.use(
    helmet({ contentSecurityPolicy: { directives: { 'img-src': ["'self'", 'data:', 'blob:'], 'worker-src': ["'self'", 'blob:'] } } }),
  );
  // Set first, so even a body the parser refuses is answered uncacheable.
  app.use('/api', (_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  const json = jsonBody({ limit: '1mb' });
  // Saved runs carry large result arrays; their route parses its own body with a larger limit.
  app.use((req, res, next) => (RUN_UPLOAD.test(req.path) ? next() : json(req, res, next)));
  app.use(
    session({
      name: 'motewalk.sid',
      secret: opts.sessionSecret,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      store: new SessionStore({ knex: db, tableName: 'sessions', createTable: false, cleanupInterval: 0 }),
      cookie: { httpOnly: true, sameSite: 'lax', secure: opts.production === true, maxAge: SESSION_IDLE_MS },
    }),
  );
  app.use(absoluteLifetime());
  const pp = configurePassport(db);
  app.use(pp.session());
  app.use(requestLog(opts.logRequests ?? false));

  const api = express.Router();
  api.use(sameOriginWrites);
  api.use('/auth', authRoutes(db, pp, opts.loginDelay));
  api.use('/people', peopleRoutes(db, mailer, opts.publicUrl));
  api.use('/outbox', outboxRoutes(db));
  api.use('/audit', auditRoutes(db));
  api.use('/', placesRoutes(db));
  api.use('/agents', agentsRoutes(db));
  api.use('/scenarios', scenariosRoutes(db));
  api.use('/runs', runsRoutes(db));
  api.use('/', decisionsRoutes(db, mailer, opts.publicUrl));
  api.use('/boards', boardsRoutes(db));
  api.use('/size-profiles', sizeProfileRoutes(db));
  api.get('/health', (_req, res) => {
    res.json({ ok: true });
  });
  api.use(notFoundHandler);
  app.use('/api', api);

  if (opts.clientDir && fs.existsSync(path.join(opts.clientDir, 'index.html'))) {
    const dir = opts.clientDir;
    app.use(express.static(dir, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => res.sendFile(path.join(dir, 'index.html')));
  }
  app.use(errorHandler);
  return app;
}
