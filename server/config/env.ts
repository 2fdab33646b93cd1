import { z } from 'zod';

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
    PORT: z.coerce.number().int().min(0).max(65535).default(3000),
    DATABASE_FILE: z.string().min(1).default('data/motewalk.sqlite'),
    SESSION_SECRET: z.string().min(16).optional(),
    // An empty value (PUBLIC_URL= in a unit file) counts as unset.
    PUBLIC_URL: z.preprocess((v) => (v === '' ? undefined : v), z.url({ protocol: /^https?$/ }).optional()),
    // Hops of reverse proxy in front of the server; 0 means X-Forwarded-* headers are ignored.
    TRUST_PROXY: z.coerce.number().int().min(0).max(10).default(0),
    SMTP_URL: z.string().optional(),
    MAIL_FROM: z.string().default('Motewalk <no-reply@motewalk.local>'),
    LOG_REQUESTS: z.enum(['0', '1']).default('1'),
    DEMO_PARTICLES: z.coerce.number().int().min(100).max(1_000_000).optional(),
  })
  // Links in e-mails must point at the real site, never at whatever host a request named.
  .refine((env) => env.NODE_ENV !== 'production' || env.PUBLIC_URL !== undefined, {
    path: ['PUBLIC_URL'],
    message: 'is required when NODE_ENV=production (the https:// address people open, used in e-mailed links)',
  });
export type Env = z.infer<typeof envSchema>;

export function parseEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const result = envSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  return result.data;
}
