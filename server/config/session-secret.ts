import fs from 'node:fs';
import path from 'node:path';
import { randomBytes } from 'node:crypto';

// Without SESSION_SECRET, keep one beside the database so sign-ins survive a restart.
export function resolveSessionSecret(configured: string | undefined, databaseFile: string): string {
  if (configured) return configured;
  if (databaseFile === ':memory:') return randomBytes(32).toString('hex');
  const file = path.join(path.dirname(path.resolve(databaseFile)), '.session-secret');
  if (fs.existsSync(file)) return fs.readFileSync(file, 'utf8').trim();
  const secret = randomBytes(32).toString('hex');
  fs.mkdirSync(path.dirname(file), { recursive: true });
  fs.writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
