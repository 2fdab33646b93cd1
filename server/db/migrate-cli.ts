import { parseEnv } from '../config/env';
import { createDb } from './knex';
import { migrationSource } from './migration-source';

const env = parseEnv();
const db = createDb(env.DATABASE_FILE);
const direction = process.argv[2] === 'down' ? 'down' : 'latest';
try {
  if (direction === 'down') {
    await db.migrate.rollback({ migrationSource }, true);
    console.log(`Rolled back every migration in ${env.DATABASE_FILE}`);
  } else {
    const [, applied] = await db.migrate.latest({ migrationSource });
    console.log(
      applied.length ? `Applied ${applied.length} migration(s) to ${env.DATABASE_FILE}` : `Database ${env.DATABASE_FILE} is up to date`,
    );
  }
} finally {
  await db.destroy();
}
