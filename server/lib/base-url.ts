import type { Request } from 'express';

export function baseUrl(req: Request, configured?: string): string {
  if (configured) return configured.replace(/\/$/, '');
  const origin = req.get('origin');
  if (origin) return origin;
  return `${req.protocol}://${req.get('host')}`;
}
