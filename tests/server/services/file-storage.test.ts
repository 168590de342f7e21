import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseConfig } from '../../../server/config/env';
import { createFileStorage, LocalDiskStorage, type FileStorage, type StoredContent } from '../../../server/services/file-storage';
import { S3Storage } from '../../../server/services/s3-storage';
import { startFakeS3, type FakeS3 } from '../../helpers/fake-s3';

let s3: FakeS3;
let dir: string;
beforeAll(async () => {
  s3 = await startFakeS3(3510);
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'boothwright-storage-'));
});
afterAll(async () => {
  await s3.stop();
  fs.rmSync(dir, { recursive: true, force: true });
});

async function bytesOf(content: StoredContent | null): Promise<Buffer | null> {
  if (!content) return null;
  const chunks: Buffer[] = [];
  for await (const chunk of content.body) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

const stores: [string, () => FileStorage][] = [
  ['local disk', () => new LocalDiskStorage(dir)],
  ['S3 (local fake)', () => createFileStorage(parseConfig({ ...s3.env }))],
];

describe.each(stores)('%s file storage', (_name, make) => {
  it('reads back what it stored, with its length, and forgets it on removal', async () => {
    const storage = make();
    const bytes = Buffer.from('%PDF-1.4 stored bytes');
    await storage.put('a1b2.pdf', bytes, 'application/pdf');
    const content = await storage.open('a1b2.pdf');
    expect(content?.sizeBytes).toBe(bytes.length);
    expect((await bytesOf(content))?.equals(bytes)).toBe(true);
    await storage.remove('a1b2.pdf');
    expect(await storage.open('a1b2.pdf')).toBeNull();
  });

  it('answers null for a key it never stored', async () => {
    expect(await make().open('never-stored.pdf')).toBeNull();
  });
});

describe('choosing the storage', () => {
  it('uses the bucket when S3_BUCKET is set and the upload folder otherwise', () => {
    expect(createFileStorage(parseConfig({ ...s3.env }))).toBeInstanceOf(S3Storage);
    expect(createFileStorage(parseConfig({ UPLOAD_DIR: dir }))).toBeInstanceOf(LocalDiskStorage);
  });

  it('refuses half a key pair and a scheduler pattern that is not cron', () => {
    expect(() => parseConfig({ S3_BUCKET: 'b', S3_ACCESS_KEY_ID: 'only-the-id' })).toThrow(/S3_SECRET_ACCESS_KEY/);
    expect(() => parseConfig({ NOTIFICATION_SCHEDULE: 'every minute' })).toThrow(/NOTIFICATION_SCHEDULE/);
  });

  it('keeps a local key inside the upload folder', async () => {
    const storage: FileStorage = new LocalDiskStorage(dir);
    await storage.put('../escape.pdf', Buffer.from('%PDF-'), 'application/pdf');
    expect(fs.existsSync(path.join(dir, 'escape.pdf'))).toBe(true);
    expect(fs.existsSync(path.join(path.dirname(dir), 'escape.pdf'))).toBe(false);
  });
});
