/**
 * The local S3-compatible fake for the demo and the two-instance check:
 *   npx tsx scripts/s3-fake.ts
 * S3_FAKE_PORT (default 4568), S3_BUCKET (default rimscale-uploads) and S3_FAKE_DIR
 * (default data/s3-fake) choose where it listens and stores. It prints the variables
 * that point the app at it.
 */
import path from 'node:path';
import { startS3Fake } from './s3-fake/start-s3-fake';

void startS3Fake({
  port: Number(process.env.S3_FAKE_PORT ?? 4568),
  bucket: process.env.S3_BUCKET || undefined,
  directory: process.env.S3_FAKE_DIR ?? path.join(process.cwd(), 'data', 's3-fake'),
}).then((fake) => {
  console.log(`s3 fake: bucket ${fake.bucket} at ${fake.env.S3_ENDPOINT}`);
  console.log(Object.entries(fake.env).map(([name, value]) => `${name}=${value}`).join(' '));
  const stop = () => void fake.stop().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
});
