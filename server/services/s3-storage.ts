import { Readable } from 'node:stream';
import type { S3Client } from '@aws-sdk/client-s3';
import type { S3Config } from '../config/env';
import type { FileStorage, StoredContent } from './file-storage';

type S3Sdk = typeof import('@aws-sdk/client-s3');

/**
 * Files in an S3-compatible bucket, so every app instance reads what any of them stored. The SDK
 * is loaded on first use: a shop on one machine never loads it (it is large).
 */
export class S3Storage implements FileStorage {
  private readonly bucket: string;
  private connection: Promise<{ sdk: S3Sdk; client: S3Client }> | undefined;

  constructor(private readonly config: S3Config) {
    this.bucket = config.bucket;
  }

  private connect(): Promise<{ sdk: S3Sdk; client: S3Client }> {
    this.connection ??= import('@aws-sdk/client-s3').then((sdk) => ({
      sdk,
      client: new sdk.S3Client({
        region: this.config.region,
        endpoint: this.config.endpoint,
        forcePathStyle: this.config.forcePathStyle,
        credentials: this.config.credentials,
        // Checksums only where S3 requires them: many S3-compatible stores reject the newer defaults.
        requestChecksumCalculation: 'WHEN_REQUIRED',
        responseChecksumValidation: 'WHEN_REQUIRED',
      }),
    }));
    return this.connection;
  }

  async put(key: string, bytes: Buffer, contentType: string): Promise<void> {
    const { sdk, client } = await this.connect();
    await client.send(new sdk.PutObjectCommand({ Bucket: this.bucket, Key: key, Body: bytes, ContentType: contentType, ContentLength: bytes.length }));
  }

  async open(key: string): Promise<StoredContent | null> {
    const { sdk, client } = await this.connect();
    try {
      const object = await client.send(new sdk.GetObjectCommand({ Bucket: this.bucket, Key: key }));
      if (!(object.Body instanceof Readable)) throw new Error('S3 answered without a readable body');
      return { body: object.Body, sizeBytes: object.ContentLength };
    } catch (error) {
      if (error instanceof sdk.NoSuchKey || (error as { name?: string }).name === 'NoSuchKey') return null;
      throw error;
    }
  }

  async remove(key: string): Promise<void> {
    const { sdk, client } = await this.connect();
    await client.send(new sdk.DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
  }
}
