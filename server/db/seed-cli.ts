import { parseEnv } from '../config/env';
import { createDb, migrateLatest } from './knex';
import { seedDemo } from './seed';

const env = parseEnv();
const db = createDb(env.DATABASE_FILE);
try {
  await migrateLatest(db);
  const seeded = await seedDemo(db, { particles: env.DEMO_PARTICLES, log: (line) => console.log(line) });
  console.log(seeded ? `Loaded demo data into ${env.DATABASE_FILE}` : `Demo data skipped: ${env.DATABASE_FILE} already has people`);
} finally {
  await db.destroy();
}
