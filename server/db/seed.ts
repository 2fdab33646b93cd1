import type { Role } from '../../shared/auth/permissions';
import { withTransaction, type Db } from './knex';
import { hashPassword } from '../auth/password';
import { countPeople, firstWithRole, insertPerson } from '../people/people.repo';
import { seedDemoWorkspace } from './demo/workspace-seed';

// Demo sign-ins for a local demo only; they are printed at start-up and never used elsewhere.
export const DEMO_PEOPLE: { email: string; name: string; role: Role; password: string }[] = [
  { email: 'admin@motewalk.local', name: 'Ilse Varga', role: 'admin', password: 'demo-admin-pass' },
  { email: 'engineer@motewalk.local', name: 'Tomas Okafor', role: 'engineer', password: 'demo-engineer-pass' },
  { email: 'viewer@motewalk.local', name: 'Maren Holt', role: 'viewer', password: 'demo-viewer-pass' },
  { email: 'operator@motewalk.local', name: 'Ravi Lindqvist', role: 'operator', password: 'demo-operator-pass' },
];

export async function seedDemo(
  db: Db,
  opts: { workspace?: boolean; particles?: number; log?: (s: string) => void } = {},
): Promise<boolean> {
  if ((await countPeople(db)) > 0) return false;
  const hashes = await Promise.all(DEMO_PEOPLE.map((p) => hashPassword(p.password)));
  await withTransaction(db, async (trx) => {
    for (const [i, p] of DEMO_PEOPLE.entries()) {
      await insertPerson(trx, { email: p.email, name: p.name, role: p.role, status: 'active', passwordHash: hashes[i] });
    }
  });
  if (opts.workspace !== false) {
    const engineer = (await firstWithRole(db, 'engineer'))!;
    opts.log?.('Loading the demo workstations and running their scenarios…');
    await seedDemoWorkspace(db, { id: engineer.id, email: engineer.email }, opts);
  }
  return true;
}
