import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { backupSqlite, restoreSqlite } from '../../../server/db/backup';
import { openDataSource } from '../../../server/db/data-source';
import { JobEntity } from '../../../server/db/entities/job.entity';
import { seedDemoShop } from '../../../server/db/seed';

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'boothwright-backup-'));
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

describe('backup and restore', () => {
  it('backs up a live database and restores it exactly, undoing later changes', async () => {
    const dbPath = path.join(dir, 'shop.sqlite');
    const dataSource = await openDataSource({ kind: 'sqlite', path: dbPath }, { migrate: true });
    await seedDemoShop(dataSource, { uploadDir: path.join(dir, 'uploads') });
    const jobsAtBackup = await dataSource.getRepository(JobEntity).find({ order: { id: 'ASC' } });
    // Backed up while the data source is open, as when the server is running.
    const file = await backupSqlite(dbPath, path.join(dir, 'backups'), new Date('2027-01-04T08:00:00Z'));
    expect(path.basename(file)).toBe('boothwright-2027-01-04T08-00-00-000Z.sqlite');
    await dataSource.getRepository(JobEntity).update({ id: jobsAtBackup[0].id }, { notes: 'changed after the backup' });
    await dataSource.destroy();

    restoreSqlite(file, dbPath);
    const restored = await openDataSource({ kind: 'sqlite', path: dbPath }, { migrate: true });
    try {
      expect(await restored.getRepository(JobEntity).find({ order: { id: 'ASC' } })).toEqual(jobsAtBackup);
      expect(await restored.query('PRAGMA integrity_check')).toEqual([{ integrity_check: 'ok' }]);
    } finally {
      await restored.destroy();
    }
  });

  it('refuses to restore a file that is not a sound database', () => {
    const bad = path.join(dir, 'bad.sqlite');
    fs.writeFileSync(bad, 'not a database');
    expect(() => restoreSqlite(bad, path.join(dir, 'other.sqlite'))).toThrow();
    expect(fs.existsSync(path.join(dir, 'other.sqlite'))).toBe(false);
  });
});
