import 'server-only';
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';
import type { ObjectStore } from './storage';

/**
 * S3 or an S3-compatible server. S3_BUCKET turns it on; S3_ENDPOINT (for a server other
 * than AWS, path-style addressing), S3_REGION (default us-east-1) and S3_PREFIX are
 * optional. Credentials come the SDK's usual way (AWS_ACCESS_KEY_ID, AWS_SECRET_ACCESS_KEY,
 * or the machine's role).
 */
export type S3Settings = { bucket: string; endpoint?: string; region: string; prefix: string };

export function s3SettingsFromEnv(env: NodeJS.ProcessEnv = process.env): S3Settings | null {
  const bucket = env.S3_BUCKET?.trim();
  if (!bucket) return null;
  const prefix = env.S3_PREFIX?.trim().replace(/^\/+|\/+$/g, '') ?? '';
  return { bucket, endpoint: env.S3_ENDPOINT?.trim() || undefined, region: env.S3_REGION?.trim() || 'us-east-1', prefix: prefix && `${prefix}/` };
}

const globalForS3 = globalThis as unknown as { rimscaleS3?: { endpoint?: string; region: string; client: S3Client } };

/** One client per process (it pools its connections), made again if the settings change. */
function client(settings: S3Settings): S3Client {
  const cached = globalForS3.rimscaleS3;
  if (cached && cached.endpoint === settings.endpoint && cached.region === settings.region) return cached.client;
  const made = new S3Client({ region: settings.region, endpoint: settings.endpoint, forcePathStyle: Boolean(settings.endpoint) });
  globalForS3.rimscaleS3 = { endpoint: settings.endpoint, region: settings.region, client: made };
  return made;
}

function isMissing(err: unknown): boolean {
  return err instanceof S3ServiceException && (err.name === 'NoSuchKey' || err.$metadata.httpStatusCode === 404);
}

export function s3Store(settings: S3Settings): ObjectStore {
  const s3 = client(settings);
  const at = (key: string) => ({ Bucket: settings.bucket, Key: `${settings.prefix}${key}` });
  return {
    async put(key, data, contentType) {
      await s3.send(new PutObjectCommand({ ...at(key), Body: data, ContentType: contentType ?? 'application/octet-stream' }));
    },
    async get(key) {
      try {
        const answer = await s3.send(new GetObjectCommand(at(key)));
        return answer.Body ? Buffer.from(await answer.Body.transformToByteArray()) : Buffer.alloc(0);
      } catch (err) {
        if (isMissing(err)) return null;
        throw err;
      }
    },
    async delete(key) {
      await s3.send(new DeleteObjectCommand(at(key)));
    },
  };
}
