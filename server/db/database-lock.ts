import fs from 'node:fs';
import Database from 'better-sqlite3';

/** Who holds a SQLite database file: the running server, or a restore in progress. */
interface Holder {
  pid: number;
  purpose: 'server' | 'restore';
  since: string;
}

export class DatabaseInUseError extends Error {}

export const lockFileOf = (databasePath: string) => `${databasePath}.lock`;

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    // EPERM: the process exists but belongs to someone else.
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

function readHolder(lockFile: string): Holder | null {
  try {
    return JSON.parse(fs.readFileSync(lockFile, 'utf8')) as Holder;
  } catch {
    return null;
  }
}

function inUseMessage(databasePath: string, holder: Holder): string {
  const who = holder.purpose === 'server' ? `A Boothwright server (process ${holder.pid}, since ${holder.since})` : `A restore (process ${holder.pid}, since ${holder.since})`;
  return `${who} is using ${databasePath}. Stop the server first (Ctrl+C in its terminal, or your service manager's stop), then try again. Nothing was changed. If no such process is running, delete ${lockFileOf(databasePath)}.`;
}

/**
 * Claims the database file for this process with a lock file beside it, so the server and a
 * restore never use it at once. A lock left by a process that has died (a crash, a power cut) is
 * taken over. Returns the release function.
 */
export function claimDatabase(databasePath: string, purpose: Holder['purpose']): () => void {
  const lockFile = lockFileOf(databasePath);
  const mine: Holder = { pid: process.pid, purpose, since: new Date().toISOString() };
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      fs.writeFileSync(lockFile, JSON.stringify(mine), { flag: 'wx', mode: 0o600 });
      return () => {
        if (readHolder(lockFile)?.pid === process.pid) fs.rmSync(lockFile, { force: true });
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const holder = readHolder(lockFile);
      if (holder && holder.pid !== process.pid && alive(holder.pid)) throw new DatabaseInUseError(inUseMessage(databasePath, holder));
      fs.rmSync(lockFile, { force: true });
    }
  }
  throw new DatabaseInUseError(`Could not claim ${databasePath}: another process keeps taking ${lockFile}`);
}

/**
 * SQLite's own locks, for a process that holds the file open without the lock file (an older
 * server, a sqlite3 shell): an exclusive lock cannot be had while any other connection is open.
 */
export function assertNoOtherConnection(databasePath: string): void {
  if (!fs.existsSync(databasePath)) return;
  const probe = new Database(databasePath, { fileMustExist: true, timeout: 0 });
  try {
    probe.pragma('locking_mode = EXCLUSIVE');
    probe.exec('BEGIN EXCLUSIVE');
    probe.exec('COMMIT');
  } catch (error) {
    if ((error as { code?: string }).code?.startsWith('SQLITE_BUSY') || /locked/.test((error as Error).message)) {
      throw new DatabaseInUseError(`${databasePath} is open in another program (a running Boothwright server, or a sqlite3 shell). Stop it first, then try again. Nothing was changed.`);
    }
    throw error;
  } finally {
    probe.close();
  }
}
