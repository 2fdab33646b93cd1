import type { Request, RequestHandler } from 'express';
import { clientIp, limitRequests, MINUTE_MS } from '../middleware/rate-limits';
import type { AccountDelay } from './account-delay';

const MESSAGE = 'Too many failed sign-in attempts from here. Wait 15 minutes, then try again, or ask an admin for a reset link.';

export const accountKey = (req: Request) =>
  String(req.body?.email ?? '')
    .trim()
    .toLowerCase();

// Only failures count, so people who type their password right are never slowed down. The lockout is
// per account *and* address, so a stranger's guesses cannot shut the owner out from their own desk.
export function loginLimits(): RequestHandler[] {
  const common = { windowMs: 15 * MINUTE_MS, onlyFailures: true, code: 'too_many_attempts', message: MESSAGE };
  const perIp = limitRequests({ ...common, limit: 30 });
  const perAccountAndIp = limitRequests({ ...common, limit: 8, key: (req) => `account:${accountKey(req)}|${clientIp(req)}` });
  return [perIp, perAccountAndIp];
}

// Guesses spread over many addresses still each wait longer than the one before.
export function waitForAccount(delay: AccountDelay): RequestHandler {
  return (req, _res, next) => {
    const ms = delay.delayMs(accountKey(req));
    if (ms === 0) return next();
    setTimeout(next, ms);
  };
}
