import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';

export type S3Fake = {
  port: number;
  bucket: string;
  /** The variables that point the app's storage at this fake. */
  env: Record<'S3_BUCKET' | 'S3_ENDPOINT' | 'S3_REGION' | 'AWS_ACCESS_KEY_ID' | 'AWS_SECRET_ACCESS_KEY', string>;
  stop: () => Promise<void>;
};

/** s3rver's fixed key pair: any request signed with it is accepted. */
const FAKE_KEY = { id: 'S3RVER', secret: 'S3RVER' };

/**
 * An S3-compatible server (s3rver) on 127.0.0.1 with one bucket, for tests, the demo and
 * the two-instance check. Port 0 picks a free one; without a folder, a temporary one that
 * is removed on stop.
 */
export async function startS3Fake(options: { port?: number; bucket?: string; directory?: string } = {}): Promise<S3Fake> {
  const bucket = options.bucket ?? 'rimscale-uploads';
  const temporary = !options.directory;
  const directory = options.directory ?? fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-s3-fake-'));
  fs.mkdirSync(directory, { recursive: true });
  const server = new S3rver({ port: options.port ?? 0, address: '127.0.0.1', silent: true, directory, configureBuckets: [{ name: bucket, configs: [] }] });
  const { port } = await server.run();
  return {
    port,
    bucket,
    env: {
      S3_BUCKET: bucket,
      S3_ENDPOINT: `http://127.0.0.1:${port}`,
      S3_REGION: 'us-east-1',
      AWS_ACCESS_KEY_ID: FAKE_KEY.id,
      AWS_SECRET_ACCESS_KEY: FAKE_KEY.secret,
    },
    stop: async () => {
      await server.close();
      if (temporary) fs.rmSync(directory, { recursive: true, force: true });
    },
  };
}
