import Database from 'better-sqlite3';
import { parseEnv } from '../config/env';
import { backupDatabase, defaultBackupPath } from './backup';

const env = parseEnv();
const destination = process.argv[2] ?? defaultBackupPath(env.DATABASE_FILE);
const { pages } = await backupDatabase(env.DATABASE_FILE, destination);
const check = new Database(destination, { readonly: true });
const integrity = check.pragma('integrity_check', { simple: true });
check.close();
console.log(`Backed up ${env.DATABASE_FILE} to ${destination} (${pages} pages, integrity ${integrity})`);
if (integrity !== 'ok') process.exitCode = 1;
