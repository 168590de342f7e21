import fs from 'node:fs';
import path from 'node:path';
import type { Readable } from 'node:stream';
import type { AppConfig } from '../config/env';
import { S3Storage } from './s3-storage';

/** Stored bytes as read back: the stream and, when the store says, its length. */
export interface StoredContent {
  body: Readable;
  sizeBytes: number | undefined;
}

/**
 * Where uploaded files live. Keys are names the server generated, never a user's words.
 * One machine keeps them on its disk; several instances share an S3-compatible bucket.
 */
export interface FileStorage {
  put(key: string, bytes: Buffer, contentType: string): Promise<void>;
  /** null when nothing is stored under the key. */
  open(key: string): Promise<StoredContent | null>;
  remove(key: string): Promise<void>;
}

/** Files in one folder on this machine (UPLOAD_DIR): the single-machine default. */
export class LocalDiskStorage implements FileStorage {
  private readonly root: string;

  constructor(dir: string) {
    this.root = path.resolve(dir);
  }

  async put(key: string, bytes: Buffer): Promise<void> {
    await fs.promises.mkdir(this.root, { recursive: true });
    await fs.promises.writeFile(this.pathOf(key), bytes, { flag: 'wx' });
  }

  async open(key: string): Promise<StoredContent | null> {
    const handle = await fs.promises.open(this.pathOf(key), 'r').catch((error: NodeJS.ErrnoException) => {
      if (error.code === 'ENOENT') return null;
      throw error;
    });
    if (!handle) return null;
    const { size } = await handle.stat();
    return { body: handle.createReadStream(), sizeBytes: size };
  }

  async remove(key: string): Promise<void> {
    await fs.promises.rm(this.pathOf(key), { force: true });
  }

  // basename: a key can never reach outside the folder.
  private pathOf(key: string): string {
    return path.join(this.root, path.basename(key));
  }
}

/** S3 when S3_BUCKET is set, otherwise the local upload folder. */
export function createFileStorage(config: Pick<AppConfig, 's3' | 'uploadDir'>): FileStorage {
  return config.s3 ? new S3Storage(config.s3) : new LocalDiskStorage(config.uploadDir);
}
