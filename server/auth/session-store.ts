import { ConnectSessionKnexStore } from 'connect-session-knex';
import type { SessionData } from 'express-session';

type ErrCb = (err?: unknown) => void;

// The store hands errors to the callback and then also rejects its promise; nobody awaits that
// promise, so on a read-only or full disk it would surface as an unhandled rejection and kill the process.
export class SessionStore extends ConnectSessionKnexStore {
  override get(sid: string, cb: (err: unknown, session?: SessionData | null) => void): Promise<SessionData | null> {
    return super.get(sid, cb).catch(() => null);
  }
  override set(sid: string, session: SessionData, cb?: ErrCb): Promise<void> {
    return super.set(sid, session, cb).catch(() => undefined);
  }
  override touch(sid: string, session: SessionData, cb?: () => void): Promise<void> {
    return super.touch(sid, session, cb).catch(() => cb?.());
  }
  override destroy(sid: string, cb?: ErrCb): Promise<number> {
    return super.destroy(sid, cb).catch(() => 0);
  }
}
