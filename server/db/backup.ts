import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';

/**
 * SQLite's online backup API: a consistent copy page by page, safe while the server is
 * running and writing (WAL readers are not blocked). Returns the file written.
 */
export async function backupSqlite(databasePath: string, backupDir: string, now = new Date()): Promise<string> {
  if (!fs.existsSync(databasePath)) throw new Error(`No database at ${databasePath}`);
  fs.mkdirSync(backupDir, { recursive: true });
  const stamp = now.toISOString().replace(/[:.]/g, '-');
  const target = path.join(backupDir, `boothwright-${stamp}.sqlite`);
  const db = new Database(databasePath, { readonly: true, fileMustExist: true });
  try {
    await db.backup(target);
  } finally {
    db.close();
  }
  return target;
}

/** Puts a backup in place of the database. The server must be stopped: its open file would be replaced under it. */
export function restoreSqlite(backupFile: string, databasePath: string): void {
  const check = new Database(backupFile, { readonly: true, fileMustExist: true });
  try {
    const result = check.pragma('integrity_check', { simple: true });
    if (result !== 'ok') throw new Error(`${backupFile} fails SQLite's integrity check: ${String(result)}`);
  } finally {
    check.close();
  }
  for (const suffix of ['-wal', '-shm']) fs.rmSync(`${databasePath}${suffix}`, { force: true });
  fs.mkdirSync(path.dirname(path.resolve(databasePath)), { recursive: true });
  fs.copyFileSync(backupFile, databasePath);
}
