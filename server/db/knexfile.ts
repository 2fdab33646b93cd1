import { parseEnv } from '../config/env';

const env = parseEnv();

export default {
  client: 'better-sqlite3',
  connection: { filename: env.DATABASE_FILE },
  useNullAsDefault: true,
  migrations: { directory: './migrations', extension: 'ts', loadExtensions: ['.ts'] },
};
