import type { RequestHandler } from 'express';
import type { Db } from '../db/knex';
import { deleteExpiredSessions } from './sessions.repo';

export const SESSION_IDLE_MS = 8 * 3600 * 1000;
export const SESSION_ABSOLUTE_MS = 12 * 3600 * 1000;

// Rolling cookies alone would keep a busy session alive for ever; this caps it from sign-in.
export function absoluteLifetime(maxMs = SESSION_ABSOLUTE_MS, now = () => Date.now()): RequestHandler {
  return (req, _res, next) => {
    const session = req.session;
    if (!session?.passport) return next();
    const started = session.signedInAt ?? now();
    if (session.signedInAt === undefined) session.signedInAt = started;
    if (now() - started <= maxMs) return next();
    session.regenerate((err) => next(err));
  };
}

export function startSessionPruning(db: Db, everyMs = 15 * 60 * 1000): () => void {
  const prune = () => deleteExpiredSessions(db).catch((err: unknown) => console.error('[sessions] pruning expired sessions failed', err));
  void prune();
  const timer = setInterval(prune, everyMs);
  timer.unref();
  return () => clearInterval(timer);
}
