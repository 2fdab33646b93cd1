import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError } from '../lib/app-error';

export const notFoundHandler: RequestHandler = (req, res) => {
  res.status(404).json({ code: 'not_found', message: `No API route for ${req.method} ${req.path}` });
};

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (err instanceof AppError) {
    res.status(err.status).json({ code: err.code, message: err.message, ...(err.issues ? { issues: err.issues } : {}), ...err.extra });
    return;
  }
  const status = typeof err?.status === 'number' && err.status >= 400 && err.status < 500 ? err.status : 500;
  if (status === 413) {
    res.status(413).json({ code: 'payload_too_large', message: 'The request body is too large' });
    return;
  }
  if (status < 500) {
    res.status(status).json({ code: 'bad_request', message: readFailure(err) });
    return;
  }
  if (isDiskOrReadOnly(err)) {
    res.status(503).json({ code: 'storage_unavailable', message: 'Storage is unavailable (full or read-only); nothing was saved' });
    return;
  }
  console.error(`[error] ${req.method} ${req.path}`, err);
  res.status(500).json({ code: 'internal', message: 'Something went wrong on the server' });
};

function readFailure(err: { type?: string; message?: string }): string {
  if (err?.type === 'entity.parse.failed') return 'The request body is not valid JSON';
  if (err?.type === 'entity.too.deep') return `The request body is not valid: ${err.message}`;
  return 'The request could not be read';
}

// SQLite's extended codes (SQLITE_IOERR_WRITE, SQLITE_READONLY_DBMOVED ...) share their family's prefix.
const STORAGE_FAMILIES = ['SQLITE_FULL', 'SQLITE_IOERR', 'SQLITE_READONLY', 'SQLITE_CANTOPEN'];
const STORAGE_ERRNOS = new Set(['ENOSPC', 'EROFS', 'EIO', 'EDQUOT']);

export function isDiskOrReadOnly(err: unknown): boolean {
  const code = (err as { code?: unknown })?.code;
  if (typeof code !== 'string') return false;
  return STORAGE_ERRNOS.has(code) || STORAGE_FAMILIES.some((family) => code === family || code.startsWith(`${family}_`));
}
