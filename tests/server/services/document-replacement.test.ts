import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { parseConfig } from '../../../server/config/env';
import { openSiteData } from '../../../server/data/site-data';
import { openDataSource } from '../../../server/db/data-source';
import { simplePdf } from '../../../server/db/demo-pdf';
import { StoredFileEntity } from '../../../server/db/entities/stored-file.entity';
import { everySite } from '../../../server/lib/site-scope';
import { systemActor } from '../../../server/services/audit';
import { createFileStorage, LocalDiskStorage, type FileStorage } from '../../../server/services/file-storage';
import { createFileService } from '../../../server/services/files';
import { createProductService } from '../../../server/services/products';
import { createSettingsService } from '../../../server/services/settings';
import { startFakeS3, type FakeS3 } from '../../helpers/fake-s3';
import { createTestDatabase, type TestDatabase } from '../../helpers/test-database';

let database: TestDatabase;
let dataSource: DataSource;
let s3: FakeS3;
beforeAll(async () => {
  database = await createTestDatabase();
  dataSource = await openDataSource(database.config, { migrate: true });
  s3 = await startFakeS3(3512);
});
afterAll(async () => {
  await s3.stop();
  await dataSource.destroy();
  await database.drop();
});

const row = { tempC: 20, flashOffMin: 10, recoatMinMin: 60, recoatMaxMin: 600, touchDryMin: 20, handleMin: 90, packMin: 300, fullCureH: 168 };
/** The product service as the system sees it (data sheets are the whole group's). */
const productService = (store: FileStorage) => {
  const data = openSiteData(dataSource, everySite);
  return createProductService(data, createFileService(data, store), createSettingsService(data));
};
const pdf = (n: number) => ({ originalname: `sheet-${n}.pdf`, buffer: simplePdf(`Sheet ${n}`, ['line']), size: 0 });

const stores: [string, () => FileStorage][] = [
  ['on disk', () => new LocalDiskStorage(path.join(database.uploadDir, 'replacement'))],
  ['in an S3 bucket', () => createFileStorage(parseConfig({ ...s3.env }))],
];

describe.each(stores)('a data sheet replaced %s', (_label, storage) => {
  it('deletes the old PDF and its record once the new one is attached, and keeps the other sheet', async () => {
    const store = storage();
    const products = productService(store);
    const product = await products.create({ name: `Replaced ${_label}`, kind: 'clear', chemistry: 'solvent-borne', volumeSolidsPct: 30, dryingTimes: [row] }, systemActor);
    const first = (await products.attachDocument(product.id, 'tds', pdf(1), systemActor)).tdsFile!;
    const safety = (await products.attachDocument(product.id, 'sds', pdf(2), systemActor)).sdsFile!;
    const keyOf = async (id: number) => (await dataSource.getRepository(StoredFileEntity).findOneByOrFail({ id })).storedName;
    const firstKey = await keyOf(first.id);
    const second = (await products.attachDocument(product.id, 'tds', pdf(3), systemActor)).tdsFile!;

    expect(await store.open(firstKey)).toBeNull();
    expect(await dataSource.getRepository(StoredFileEntity).existsBy({ id: first.id })).toBe(false);
    for (const id of [second.id, safety.id]) {
      const content = await store.open(await keyOf(id));
      expect(content).not.toBeNull();
      content!.body.destroy();
    }
  });

  it('deletes the new bytes when the change cannot be made', async () => {
    const store = storage();
    const products = productService(store);
    const before = await dataSource.getRepository(StoredFileEntity).count();
    await expect(products.attachDocument(999_999, 'tds', pdf(4), systemActor)).rejects.toThrow(/Product/);
    expect(await dataSource.getRepository(StoredFileEntity).count()).toBe(before);
    if (store instanceof LocalDiskStorage) {
      const dir = path.join(database.uploadDir, 'replacement');
      const names = fs.existsSync(dir) ? fs.readdirSync(dir) : [];
      const recorded = new Set((await dataSource.getRepository(StoredFileEntity).find()).map((f) => f.storedName));
      expect(names.filter((n) => !recorded.has(n))).toEqual([]);
    }
  });
});
