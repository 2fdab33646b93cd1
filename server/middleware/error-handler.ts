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
    const message = err?.type === 'entity.parse.failed' ? 'The request body is not valid JSON' : 'The request could not be read';
    res.status(status).json({ code: 'bad_request', message });
    return;
  }
  if (isDiskOrReadOnly(err)) {
    res.status(503).json({ code: 'storage_unavailable', message: 'Storage is unavailable (full or read-only); nothing was saved' });
    return;
  }
  console.error(`[error] ${req.method} ${req.path}`, err);
  res.status(500).json({ code: 'internal', message: 'Something went wrong on the server' });
};

function isDiskOrReadOnly(err: unknown): boolean {
  const code = (err as { code?: string })?.code ?? '';
  return code === 'SQLITE_FULL' || code.startsWith('SQLITE_READONLY') || code === 'SQLITE_IOERR' || code === 'ENOSPC';
}
