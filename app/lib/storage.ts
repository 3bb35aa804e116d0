import 'server-only';
import { diskStore } from './storage-disk';
import { s3Store, s3SettingsFromEnv } from './storage-s3';

/**
 * Stored uploads (photos, and any stored file): in an S3-compatible bucket when
 * S3_BUCKET is set, so every app instance sees the same files, else on local disk
 * (`RIMSCALE_UPLOAD_DIR` or `data/uploads`).
 * Keys are ours (never a user's file name): lowercase letters, digits, `-`, `_`, `.` and `/`.
 */
export type ObjectStore = {
  put: (key: string, data: Buffer, contentType?: string) => Promise<void>;
  get: (key: string) => Promise<Buffer | null>;
  delete: (key: string) => Promise<void>;
};

const KEY_PATTERN = /^[a-z0-9][a-z0-9_.-]*(\/[a-z0-9][a-z0-9_.-]*)*$/;

function checkedKey(key: string): string {
  if (!KEY_PATTERN.test(key) || key.includes('..')) throw new Error(`Invalid storage key ${JSON.stringify(key)}`);
  return key;
}

/** The store the settings name now (read on every call, so tests and scripts can switch). */
function store(): ObjectStore {
  const s3 = s3SettingsFromEnv();
  return s3 ? s3Store(s3) : diskStore();
}

export async function putObject(key: string, data: Buffer, contentType?: string): Promise<void> {
  await store().put(checkedKey(key), data, contentType);
}

export async function getObject(key: string): Promise<Buffer | null> {
  return store().get(checkedKey(key));
}

export async function deleteObject(key: string): Promise<void> {
  await store().delete(checkedKey(key));
}
