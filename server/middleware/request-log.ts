import type { RequestHandler } from 'express';

// Built assets (a file name with an extension outside /api) would drown the log; pages and API calls stay.
const isStaticFile = (path: string) => !path.startsWith('/api/') && /\.[a-z0-9]+$/i.test(path);

/**
 * One log line, or null for a static file. The path is the full one (/api/scenarios/3, not the router's /3)
 * without its query string, which may carry tokens.
 */
export function requestLogLine(method: string, originalUrl: string, status: number, ms: number, who: string): string | null {
  const path = originalUrl.split('?')[0];
  if (isStaticFile(path)) return null;
  return `${method} ${path} ${status} ${ms.toFixed(1)}ms ${who}`;
}

// Logs method, path, status and time; never bodies or cookies.
export function requestLog(enabled: boolean): RequestHandler {
  return (req, res, next) => {
    if (!enabled) return next();
    const started = process.hrtime.bigint();
    res.on('finish', () => {
      const ms = Number(process.hrtime.bigint() - started) / 1e6;
      const line = requestLogLine(req.method, req.originalUrl, res.statusCode, ms, req.user ? `person ${req.user.id}` : 'anonymous');
      if (line) console.log(line);
    });
    next();
  };
}
