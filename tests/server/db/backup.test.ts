import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseConfig } from '../../../server/config/env';
import { backupShop, restoreShop, type Shop } from '../../../server/db/backup';
import { lockFileOf } from '../../../server/db/database-lock';
import { openDataSource } from '../../../server/db/data-source';
import { JobEntity } from '../../../server/db/entities/job.entity';
import { StoredFileEntity } from '../../../server/db/entities/stored-file.entity';
import { seedDemoShop } from '../../../server/db/seed';
import { createFileStorage, LocalDiskStorage, type FileStorage } from '../../../server/services/file-storage';
import { startFakeS3, type FakeS3 } from '../../helpers/fake-s3';

let dir: string;
let s3: FakeS3;
beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'boothwright-backup-'));
  s3 = await startFakeS3(3511);
});
afterAll(async () => {
  await s3.stop();
  fs.rmSync(dir, { recursive: true, force: true });
});

const modeOf = (file: string) => fs.statSync(file).mode & 0o777;

async function bytesIn(storage: FileStorage, key: string): Promise<Buffer | null> {
  const content = await storage.open(key);
  if (!content) return null;
  const chunks: Buffer[] = [];
  for await (const chunk of content.body) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

/** A seeded shop (with its demo data sheet) whose database is closed again, as after stopping the server. */
async function seededShop(name: string, storage: (uploadDir: string) => FileStorage): Promise<Shop & { uploadDir: string }> {
  const databasePath = path.join(dir, name, 'shop.sqlite');
  const uploadDir = path.join(dir, name, 'uploads');
  const shop = { databasePath, uploadDir, storage: storage(uploadDir) };
  const dataSource = await openDataSource({ kind: 'sqlite', path: databasePath }, { migrate: true });
  await seedDemoShop(dataSource, { uploadDir, storage: shop.storage });
  await dataSource.destroy();
  return shop;
}

const stores: [string, (uploadDir: string) => FileStorage][] = [
  ['an upload folder', (uploadDir) => new LocalDiskStorage(uploadDir)],
  ['an S3 bucket', () => createFileStorage(parseConfig({ ...s3.env }))],
];

describe.each(stores)('backup and restore with uploads in %s', (label, storage) => {
  it('backs up the database and every uploaded file owner-only, and a restore brings both back', async () => {
    const shop = await seededShop(label.replace(/\W/g, '-'), storage);
    const dataSource = await openDataSource({ kind: 'sqlite', path: shop.databasePath }, { migrate: false });
    const jobsAtBackup = await dataSource.getRepository(JobEntity).find({ order: { id: 'ASC' } });
    const files = await dataSource.getRepository(StoredFileEntity).find();
    expect(files.length).toBeGreaterThan(0);
    const originals = new Map(await Promise.all(files.map(async (f) => [f.storedName, await bytesIn(shop.storage, f.storedName)] as const)));

    // Backed up while the database is open, as when the server is running.
    const result = await backupShop(shop, path.join(path.dirname(shop.databasePath), 'backups'), new Date('2027-01-04T08:00:00Z'));
    expect(path.basename(result.folder)).toBe('boothwright-2027-01-04T08-00-00-000Z');
    expect(result).toMatchObject({ files: files.length, missing: [] });
    expect(modeOf(path.dirname(result.folder))).toBe(0o700);
    expect(modeOf(result.folder)).toBe(0o700);
    expect(modeOf(path.join(result.folder, 'database.sqlite'))).toBe(0o600);
    for (const name of fs.readdirSync(path.join(result.folder, 'files'))) expect(modeOf(path.join(result.folder, 'files', name))).toBe(0o600);

    // Later changes, a lost upload, then the server is stopped.
    await dataSource.getRepository(JobEntity).update({ id: jobsAtBackup[0].id }, { notes: 'changed after the backup' });
    for (const f of files) await shop.storage.remove(f.storedName);
    await dataSource.destroy();

    expect(await restoreShop(result.folder, shop)).toEqual({ files: files.length, withFiles: true });
    const restored = await openDataSource({ kind: 'sqlite', path: shop.databasePath }, { migrate: true });
    try {
      expect(await restored.getRepository(JobEntity).find({ order: { id: 'ASC' } })).toEqual(jobsAtBackup);
      expect(await restored.query('PRAGMA integrity_check')).toEqual([{ integrity_check: 'ok' }]);
    } finally {
      await restored.destroy();
    }
    for (const [key, bytes] of originals) expect(await bytesIn(shop.storage, key)).toEqual(bytes);
    expect(modeOf(shop.databasePath)).toBe(0o600);
  });
});

describe('restore onto a database in use', () => {
  let shop: Shop & { uploadDir: string };
  let backupFolder: string;
  beforeAll(async () => {
    shop = await seededShop('in-use', (uploadDir) => new LocalDiskStorage(uploadDir));
    backupFolder = (await backupShop(shop, path.join(dir, 'in-use-backups'))).folder;
  });

  it('refuses while a running server holds the database, says what to do, and changes nothing', async () => {
    // Another live process holds the lock, as the server does from start to stop.
    const server = spawn('sleep', ['30']);
    fs.writeFileSync(lockFileOf(shop.databasePath), JSON.stringify({ pid: server.pid, purpose: 'server', since: '2027-01-04T08:00:00.000Z' }));
    const before = fs.readFileSync(shop.databasePath);
    try {
      await expect(restoreShop(backupFolder, shop)).rejects.toThrow(new RegExp(`Boothwright server \\(process ${server.pid}.*Stop the server first.*Nothing was changed`));
      expect(fs.readFileSync(shop.databasePath)).toEqual(before);
      expect(fs.existsSync(lockFileOf(shop.databasePath))).toBe(true);
    } finally {
      server.kill();
      fs.rmSync(lockFileOf(shop.databasePath));
    }
  });

  it('refuses while any other connection has the file open', async () => {
    const open = await openDataSource({ kind: 'sqlite', path: shop.databasePath }, { migrate: false });
    try {
      await open.query('SELECT 1');
      await expect(restoreShop(backupFolder, shop)).rejects.toThrow(/open in another program.*Nothing was changed/);
    } finally {
      await open.destroy();
    }
  });

  it('takes over the lock of a server that died without releasing it', async () => {
    fs.writeFileSync(lockFileOf(shop.databasePath), JSON.stringify({ pid: 2 ** 22 + 12345, purpose: 'server', since: '2027-01-04T08:00:00.000Z' }));
    await expect(restoreShop(backupFolder, shop)).resolves.toMatchObject({ withFiles: true });
    expect(fs.existsSync(lockFileOf(shop.databasePath))).toBe(false);
  });

  it('refuses a file that is not a sound database', async () => {
    const bad = path.join(dir, 'bad.sqlite');
    fs.writeFileSync(bad, 'not a database');
    const target = { databasePath: path.join(dir, 'other.sqlite'), storage: new LocalDiskStorage(path.join(dir, 'other-uploads')) };
    await expect(restoreShop(bad, target)).rejects.toThrow();
    expect(fs.existsSync(target.databasePath)).toBe(false);
  });
});
