import 'server-only';
import fs from 'node:fs/promises';
import path from 'node:path';
import type { ObjectStore } from './storage';

/** Local disk: `RIMSCALE_UPLOAD_DIR` or `data/uploads` (one machine only). */
export function uploadRoot(): string {
  return process.env.RIMSCALE_UPLOAD_DIR || path.join(process.cwd(), 'data', 'uploads');
}

// The upload folder is chosen at run time; keep the bundler from tracing it.
const keyPath = (key: string) => path.join(/*turbopackIgnore: true*/ uploadRoot(), key);

export function diskStore(): ObjectStore {
  return {
    async put(key, data) {
      const file = keyPath(key);
      await fs.mkdir(path.dirname(file), { recursive: true });
      // Write then rename, so a reader never sees half a file.
      const partial = `${file}.${process.pid}.partial`;
      await fs.writeFile(partial, data);
      await fs.rename(partial, file);
    },
    async get(key) {
      try {
        return await fs.readFile(/*turbopackIgnore: true*/ keyPath(key));
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw err;
      }
    },
    async delete(key) {
      await fs.rm(keyPath(key), { force: true });
    },
  };
}
