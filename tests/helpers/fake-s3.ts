import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';

export interface FakeS3 {
  /** The variables that point an app instance at this bucket. */
  env: Record<'S3_ENDPOINT' | 'S3_BUCKET' | 'S3_REGION' | 'S3_ACCESS_KEY_ID' | 'S3_SECRET_ACCESS_KEY' | 'S3_FORCE_PATH_STYLE', string>;
  /** Where s3rver keeps the objects on disk. */
  directory: string;
  stop(): Promise<void>;
}

/**
 * A local S3-compatible server (s3rver) on 127.0.0.1 with one empty bucket, its objects in a
 * temp folder. s3rver checks request signatures against its one fixed key pair, S3RVER/S3RVER.
 */
export async function startFakeS3(port: number, bucket = 'boothwright-test'): Promise<FakeS3> {
  const directory = fs.mkdtempSync(path.join(os.tmpdir(), 'boothwright-s3-'));
  const server = new S3rver({ address: '127.0.0.1', port, directory, silent: true, configureBuckets: [{ name: bucket }] });
  await server.run();
  return {
    env: { S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_BUCKET: bucket, S3_REGION: 'us-east-1', S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER', S3_FORCE_PATH_STYLE: 'true' },
    directory,
    stop: async () => {
      await server.close();
      fs.rmSync(directory, { recursive: true, force: true });
    },
  };
}
