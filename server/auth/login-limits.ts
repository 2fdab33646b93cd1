import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { AppError } from '../lib/app-error';

const WINDOW_MS = 15 * 60 * 1000;

const refuse: RequestHandler = (_req, _res, next) =>
  next(
    new AppError(
      429,
      'too_many_attempts',
      'Too many failed sign-in attempts. Wait 15 minutes, then try again, or ask an admin for a reset link.',
    ),
  );

// Only failures count, so people who type their password right are never slowed down.
export function loginLimits(): RequestHandler[] {
  const perIp = rateLimit({
    windowMs: WINDOW_MS,
    limit: 30,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: refuse,
  });
  const perAccount = rateLimit({
    windowMs: WINDOW_MS,
    limit: 8,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) =>
      `account:${String(req.body?.email ?? '')
        .trim()
        .toLowerCase()}`,
    handler: refuse,
  });
  return [perIp, perAccount];
}
