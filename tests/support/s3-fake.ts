import { S3Client } from '@aws-sdk/client-s3';
import { startS3Fake, type S3Fake } from '@/scripts/s3-fake/start-s3-fake';

/**
 * Starts the project's S3 fake on a free port and points the app's storage at it
 * (S3_BUCKET, S3_ENDPOINT and the fake's key pair); stop() restores disk storage.
 * `client` is a separate SDK client for looking into the bucket from the test.
 */
export async function useS3Fake(options: { prefix?: string } = {}): Promise<S3Fake & { client: S3Client }> {
  const fake = await startS3Fake();
  Object.assign(process.env, fake.env, options.prefix ? { S3_PREFIX: options.prefix } : {});
  const client = new S3Client({
    endpoint: fake.env.S3_ENDPOINT,
    region: fake.env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: fake.env.AWS_ACCESS_KEY_ID, secretAccessKey: fake.env.AWS_SECRET_ACCESS_KEY },
  });
  return {
    ...fake,
    client,
    stop: async () => {
      client.destroy();
      for (const name of [...Object.keys(fake.env), 'S3_PREFIX']) delete process.env[name];
      await fake.stop();
    },
  };
}
