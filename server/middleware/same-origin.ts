import type { RequestHandler } from 'express';
import { AppError } from '../lib/app-error';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

// Writes must come from our own pages: same Origin (or Referer) as the Host, or the session's CSRF token.
export const sameOriginWrites: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  const host = req.get('host');
  const origin = req.get('origin') ?? refererOrigin(req.get('referer'));
  if (origin && host && sameHost(origin, host)) return next();
  const token = req.get('x-csrf-token');
  if (token && req.session?.csrfToken && token === req.session.csrfToken) return next();
  next(new AppError(403, 'cross_origin', 'Write refused: the request did not come from a Motewalk page'));
};

function refererOrigin(referer: string | undefined): string | undefined {
  if (!referer) return undefined;
  try {
    return new URL(referer).origin;
  } catch {
    return undefined;
  }
}

function sameHost(origin: string, host: string): boolean {
  try {
    return new URL(origin).host === host;
  } catch {
    return false;
  }
}
