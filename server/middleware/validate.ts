import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { AppError, type Issue } from '../lib/app-error';

type Schemas = { body?: z.ZodType; query?: z.ZodType; params?: z.ZodType };

export function toIssues(error: z.ZodError, prefix: string): Issue[] {
  return error.issues.map((i) => ({ path: [prefix, ...i.path.map(String)].join('.'), message: i.message }));
}

// Parsed values replace the raw ones so controllers only see validated data.
export function validate(schemas: Schemas): RequestHandler {
  return (req, _res, next) => {
    const issues: Issue[] = [];
    const parsed: Record<string, unknown> = {};
    for (const key of ['params', 'query', 'body'] as const) {
      const schema = schemas[key];
      if (!schema) continue;
      const result = schema.safeParse(req[key] ?? {});
      if (result.success) parsed[key] = result.data;
      else issues.push(...toIssues(result.error, key));
    }
    if (issues.length) throw new AppError(400, 'invalid_input', 'Some fields are not valid', issues);
    if ('body' in parsed) req.body = parsed.body;
    if ('params' in parsed) req.params = parsed.params as typeof req.params;
    if ('query' in parsed) Object.defineProperty(req, 'query', { value: parsed.query, writable: true });
    next();
  };
}
