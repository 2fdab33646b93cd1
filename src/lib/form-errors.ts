import type { z } from 'zod';
import { ApiError } from './api-client';

// Same messages whether the shared schema fails here or on the server.
export function fieldErrors(result: z.ZodSafeParseResult<unknown> | undefined, serverError?: unknown): Record<string, string> {
  const out: Record<string, string> = {};
  if (result && !result.success) for (const i of result.error.issues) out[i.path.join('.')] ??= i.message;
  if (serverError instanceof ApiError) for (const i of serverError.issues) out[i.path.replace(/^body\./, '')] ??= i.message;
  return out;
}
