import type { RequestHandler } from 'express';

// Logs method, path (no query string: it may carry tokens), status and time; never bodies or cookies.
export function requestLog(enabled: boolean): RequestHandler {
  return (req, res, next) => {
    if (!enabled) return next();
    const started = process.hrtime.bigint();
    res.on('finish', () => {
      const ms = Number(process.hrtime.bigint() - started) / 1e6;
      const who = req.user ? `person ${req.user.id}` : 'anonymous';
      console.log(`${req.method} ${req.path} ${res.statusCode} ${ms.toFixed(1)}ms ${who}`);
    });
    next();
  };
}
