import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deletePhotoFiles, photoFileResponse, storePhotoFiles } from '@/app/lib/photo-files';

let dir: string;
beforeAll(() => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-photo-files-'));
  process.env.RIMSCALE_UPLOAD_DIR = dir;
});
afterAll(() => {
  delete process.env.RIMSCALE_UPLOAD_DIR;
  fs.rmSync(dir, { recursive: true, force: true });
});

// The bytes stand for an already re-encoded image: these helpers only store, serve and delete them.
const photo = { contentType: 'image/png' as const, data: Buffer.from('full image'), thumbnail: Buffer.from('thumb'), widthPx: 4, heightPx: 3 };
const onDisk = (key: string) => fs.existsSync(path.join(dir, key));

describe('photo files', () => {
  it('stores the image and its WebP thumbnail under the owner’s folder and serves either', async () => {
    const stored = await storePhotoFiles('builds/3', photo, async (keys) => ({ ...keys, contentType: photo.contentType }));
    expect(stored.storageKey).toMatch(/^builds\/3\/[0-9a-f-]{36}\.png$/);
    expect(stored.thumbKey).toMatch(/^builds\/3\/[0-9a-f-]{36}-thumb\.webp$/);
    const full = await photoFileResponse(new Request('http://x/p'), stored);
    expect(full?.headers.get('content-type')).toBe('image/png');
    expect(Buffer.from(await full!.arrayBuffer()).toString()).toBe('full image');
    const thumb = await photoFileResponse(new Request('http://x/p?size=thumb'), stored);
    expect(thumb?.headers.get('content-type')).toBe('image/webp');
    expect(Buffer.from(await thumb!.arrayBuffer()).toString()).toBe('thumb');
    await deletePhotoFiles(stored);
    expect([onDisk(stored.storageKey), onDisk(stored.thumbKey)]).toEqual([false, false]);
    expect(await photoFileResponse(new Request('http://x/p'), stored)).toBeNull();
  });

  it('leaves no files behind when the row cannot be written', async () => {
    let keys: { storageKey: string; thumbKey: string } | undefined;
    await expect(
      storePhotoFiles('templates/9', photo, async (k) => {
        keys = k;
        throw new Error('owner deleted meanwhile');
      }),
    ).rejects.toThrow('owner deleted meanwhile');
    expect([onDisk(keys!.storageKey), onDisk(keys!.thumbKey)]).toEqual([false, false]);
  });
});
