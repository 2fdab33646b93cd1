import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit, type Options } from 'express-rate-limit';
import { AppError } from '../lib/app-error';

export const MINUTE_MS = 60 * 1000;

type LimitOptions = {
  windowMs: number;
  limit: number;
  key?: (req: Request) => string;
  onlyFailures?: boolean;
  code: string;
  message: string;
};

// The client address as Express sees it: with TRUST_PROXY off, X-Forwarded-For never changes it.
export const clientIp = (req: Request) => ipKeyGenerator(req.ip ?? req.socket.remoteAddress ?? 'unknown');

export function limitRequests(o: LimitOptions): RequestHandler {
  const options: Partial<Options> = {
    windowMs: o.windowMs,
    limit: o.limit,
    skipSuccessfulRequests: o.onlyFailures ?? false,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: o.key ?? clientIp,
    // Ignoring the header when no proxy is trusted is the point, not a mistake to warn about.
    validate: { xForwardedForHeader: false },
    handler: (_req, _res, next) => next(new AppError(429, o.code, o.message)),
  };
  return rateLimit(options);
}

export const shareMailLimit = (): RequestHandler =>
  limitRequests({
    windowMs: 60 * MINUTE_MS,
    limit: 20,
    key: (req) => `person:${req.user?.id ?? clientIp(req)}`,
    code: 'too_many_mails',
    message: 'You have e-mailed 20 reports in the last hour. Wait a while before sending more.',
  });

export const setPasswordLimit = (): RequestHandler =>
  limitRequests({
    windowMs: 15 * MINUTE_MS,
    limit: 10,
    code: 'too_many_attempts',
    message: 'Too many attempts to set a password. Wait 15 minutes, then open the link again.',
  });
