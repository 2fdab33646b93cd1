import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';

// SQLite's online backup API copies a consistent snapshot page by page while the server keeps writing.
export async function backupDatabase(source: string, destination: string): Promise<{ destination: string; pages: number }> {
  if (!fs.existsSync(source)) throw new Error(`No database at ${source}`);
  fs.mkdirSync(path.dirname(path.resolve(destination)), { recursive: true });
  const db = new Database(source, { fileMustExist: true });
  try {
    const result = await db.backup(destination);
    return { destination, pages: result.totalPages };
  } finally {
    db.close();
  }
}

export function defaultBackupPath(source: string, now = new Date()): string {
  const stamp = now.toISOString().replace(/[-:]/g, '').replace(/\..*/, '').replace('T', '-');
  return path.join(path.dirname(path.resolve(source)), 'backups', `motewalk-${stamp}.sqlite`);
}
