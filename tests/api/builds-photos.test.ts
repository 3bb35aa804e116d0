import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { actAs } from '@/tests/support/session';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { BUILD_SAMPLE, buildApi } from './builds-support';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest({ actingAs: 'technician' });
let ws: string;
let uploadDir: string;
let buildId: number;

beforeEach(async () => {
  ws = world.shop.slug;
  uploadDir = fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-build-uploads-'));
  process.env.RIMSCALE_UPLOAD_DIR = uploadDir;
  buildId = (await (await buildApi.create(ws, BUILD_SAMPLE)).json()).build.id;
});
afterEach(() => {
  delete process.env.RIMSCALE_UPLOAD_DIR;
  fs.rmSync(uploadDir, { recursive: true, force: true });
});

const storedFiles = () => fs.readdirSync(uploadDir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile());

describe('build record photos (the template photo pipeline)', () => {
  it('takes a JPEG by its content, stores it re-encoded without its camera metadata, and shows it to a viewer', async () => {
    // A JPEG carrying EXIF (camera make), written by sharp; sharp reads the stored bytes back independently.
    const withExif = await sharp({ create: { width: 80, height: 60, channels: 3, background: { r: 30, g: 90, b: 160 } } })
      .jpeg()
      .withExif({ IFD0: { Make: 'Invented Camera Co' } })
      .toBuffer();
    expect((await sharp(withExif).metadata()).exif).toBeDefined();
    const response = await buildApi.upload(ws, buildId, new Blob([new Uint8Array(withExif)]), 'flywheel-mark.bin');
    expect(response.status).toBe(201);
    const { photo } = await response.json();
    expect(photo).toMatchObject({ buildId, contentType: 'image/jpeg', widthPx: 80, heightPx: 60 });

    actAs(world.users.viewer.id);
    const image = await buildApi.photo(ws, buildId, photo.id);
    expect(image.headers.get('content-type')).toBe('image/jpeg');
    const stored = await sharp(Buffer.from(await image.arrayBuffer())).metadata();
    expect(stored.format).toBe('jpeg');
    expect(stored.exif).toBeUndefined();
    expect((await buildApi.upload(ws, buildId, new Blob([new Uint8Array(withExif)]), 'x.jpg')).status).toBe(403);
  });

  it('refuses a text file with 415 and stores nothing; deleting the record removes its photo files', async () => {
    const refused = await buildApi.upload(ws, buildId, new Blob(['not a picture']), 'notes.png');
    expect(refused.status).toBe(415);
    expect(storedFiles()).toEqual([]);
    const png = await sharp({ create: { width: 16, height: 16, channels: 3, background: { r: 0, g: 0, b: 0 } } }).png().toBuffer();
    expect((await buildApi.upload(ws, buildId, new Blob([new Uint8Array(png)]), 'a.png')).status).toBe(201);
    expect(storedFiles()).toHaveLength(2); // the photo and its thumbnail
    actAs(world.users.owner.id);
    expect((await buildApi.delete(ws, buildId)).status).toBe(204);
    expect(storedFiles()).toEqual([]);
  });
});
