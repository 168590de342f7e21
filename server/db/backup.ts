import fs from 'node:fs';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import Database from 'better-sqlite3';
import type { FileStorage } from '../services/file-storage';
import { assertNoOtherConnection, claimDatabase } from './database-lock';

/** What a backup holds: the database and every uploaded file it records. */
export interface Shop {
  databasePath: string;
  /** Where the uploads live: the upload folder or the S3 bucket. */
  storage: FileStorage;
}

export interface BackupResult {
  folder: string;
  files: number;
  /** Files the database records but the storage did not have. */
  missing: string[];
}

const databaseFile = 'database.sqlite';
const filesFolder = 'files';
// Backups hold password hashes and the shop's records: only the owner may read them.
const privateFolder = (dir: string) => {
  fs.mkdirSync(dir, { recursive: true, mode: 0o700 });
  fs.chmodSync(dir, 0o700);
};

function storedFiles(databasePath: string): { storedName: string; mimeType: string }[] {
  const db = new Database(databasePath, { readonly: true, fileMustExist: true });
  try {
    return db.prepare('SELECT stored_name AS storedName, mime_type AS mimeType FROM stored_files ORDER BY id').all() as { storedName: string; mimeType: string }[];
  } finally {
    db.close();
  }
}

/**
 * A consistent copy of the database (SQLite's online backup API: safe while the server runs and
 * writes) and of every file that copy records, into a new owner-only folder under `backupRoot`.
 */
export async function backupShop(shop: Shop, backupRoot: string, now = new Date()): Promise<BackupResult> {
  if (!fs.existsSync(shop.databasePath)) throw new Error(`No database at ${shop.databasePath}`);
  const folder = path.join(backupRoot, `boothwright-${now.toISOString().replace(/[:.]/g, '-')}`);
  privateFolder(backupRoot);
  fs.mkdirSync(folder, { mode: 0o700 });
  privateFolder(path.join(folder, filesFolder));
  const target = path.join(folder, databaseFile);
  const db = new Database(shop.databasePath, { readonly: true, fileMustExist: true });
  try {
    await db.backup(target);
  } finally {
    db.close();
  }
  fs.chmodSync(target, 0o600);
  const missing: string[] = [];
  const files = storedFiles(target);
  for (const { storedName } of files) {
    const content = await shop.storage.open(storedName);
    if (!content) missing.push(storedName);
    else await pipeline(content.body, fs.createWriteStream(path.join(folder, filesFolder, path.basename(storedName)), { flags: 'wx', mode: 0o600 }));
  }
  const manifest = { createdAt: now.toISOString(), database: databaseFile, files: files.length - missing.length, missing };
  fs.writeFileSync(path.join(folder, 'manifest.json'), JSON.stringify(manifest, null, 2), { mode: 0o600 });
  return { folder, files: manifest.files, missing };
}

function checkIntegrity(file: string): void {
  const check = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const result = check.pragma('integrity_check', { simple: true });
    if (result !== 'ok') throw new Error(`${file} fails SQLite's integrity check: ${String(result)}`);
  } finally {
    check.close();
  }
}

/** Puts the backup's files back into the storage; a file already there (same generated name, same bytes) stays. */
async function restoreFiles(folder: string, databaseCopy: string, storage: FileStorage): Promise<number> {
  let restored = 0;
  for (const { storedName, mimeType } of storedFiles(databaseCopy)) {
    const source = path.join(folder, filesFolder, path.basename(storedName));
    if (!fs.existsSync(source)) continue;
    try {
      await storage.put(storedName, fs.readFileSync(source), mimeType);
      restored++;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    }
  }
  return restored;
}

/**
 * Puts a backup (a folder from backupShop, or an older database-only .sqlite file) in place of the
 * shop's database and uploads. Refuses while the server, or anything else, has the database open:
 * replacing the file under a running server corrupts it and loses what it writes.
 */
export async function restoreShop(backup: string, shop: Shop): Promise<{ files: number; withFiles: boolean }> {
  const withFiles = fs.statSync(backup).isDirectory();
  const databaseCopy = withFiles ? path.join(backup, databaseFile) : backup;
  checkIntegrity(databaseCopy);
  const release = claimDatabase(shop.databasePath, 'restore');
  try {
    assertNoOtherConnection(shop.databasePath);
    const files = withFiles ? await restoreFiles(backup, databaseCopy, shop.storage) : 0;
    const staging = `${shop.databasePath}.restoring`;
    fs.mkdirSync(path.dirname(path.resolve(shop.databasePath)), { recursive: true });
    fs.copyFileSync(databaseCopy, staging);
    fs.chmodSync(staging, 0o600);
    for (const suffix of ['-wal', '-shm']) fs.rmSync(`${shop.databasePath}${suffix}`, { force: true });
    // A rename is atomic: the database is the old one or the restored one, never half of each.
    fs.renameSync(staging, shop.databasePath);
    return { files, withFiles };
  } finally {
    release();
  }
}
