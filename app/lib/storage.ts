import 'server-only';
import fs from 'node:fs/promises';
import path from 'node:path';

/**
 * Stored uploads on local disk: `RIMSCALE_UPLOAD_DIR` or `data/uploads`.
 * Keys are ours (never a user's file name): lowercase letters, digits, `-`, `_`, `.` and `/`.
 */
export function uploadRoot(): string {
  return process.env.RIMSCALE_UPLOAD_DIR || path.join(process.cwd(), 'data', 'uploads');
}

const KEY_PATTERN = /^[a-z0-9][a-z0-9_.-]*(\/[a-z0-9][a-z0-9_.-]*)*$/;

function keyPath(key: string): string {
  if (!KEY_PATTERN.test(key) || key.includes('..')) throw new Error(`Invalid storage key ${JSON.stringify(key)}`);
  // The upload folder is chosen at run time; keep the bundler from tracing it.
  return path.join(/*turbopackIgnore: true*/ uploadRoot(), key);
}

export async function putObject(key: string, data: Buffer): Promise<void> {
  const file = keyPath(key);
  await fs.mkdir(path.dirname(file), { recursive: true });
  // Write then rename, so a reader never sees half a file.
  const partial = `${file}.${process.pid}.partial`;
  await fs.writeFile(partial, data);
  await fs.rename(partial, file);
}

export async function getObject(key: string): Promise<Buffer | null> {
  try {
    return await fs.readFile(/*turbopackIgnore: true*/ keyPath(key));
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
    throw err;
  }
}

export async function deleteObject(key: string): Promise<void> {
  await fs.rm(keyPath(key), { force: true });
}
