import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { actAs } from '@/tests/support/session';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { api, SAMPLE } from '@/tests/app/api/v1/workspaces/[workspace]/templates/templates-support';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest({ actingAs: 'technician' });
let ws: string;
let uploadDir: string;
let templateId: number;

beforeEach(async () => {
  ws = world.shop.slug;
  uploadDir = fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-uploads-'));
  process.env.RIMSCALE_UPLOAD_DIR = uploadDir;
  templateId = (await (await api.create(ws, SAMPLE)).json()).template.id;
});
afterEach(() => {
  delete process.env.RIMSCALE_UPLOAD_DIR;
  fs.rmSync(uploadDir, { recursive: true, force: true });
});

const png = () => sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 200, g: 40, b: 40 } } }).png().toBuffer();

function storedFiles(): string[] {
  return fs.readdirSync(uploadDir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile()).map((e) => path.join(e.parentPath, e.name));
}

describe('template photo uploads', () => {
  it('accepts a PNG named .jpg as a PNG, by its content, and keeps a thumbnail', async () => {
    const response = await api.upload(ws, templateId, new Blob([new Uint8Array(await png())], { type: 'image/jpeg' }), 'pointer.jpg');
    expect(response.status).toBe(201);
    const { photo } = await response.json();
    expect(photo).toMatchObject({ contentType: 'image/png', widthPx: 64, heightPx: 48, templateId });

    const image = await api.photo(ws, templateId, photo.id);
    expect(image.headers.get('content-type')).toBe('image/png');
    // sharp reads the stored bytes independently of our own signature check.
    expect((await sharp(Buffer.from(await image.arrayBuffer())).metadata()).format).toBe('png');
    const thumb = await api.photo(ws, templateId, photo.id, 'thumb');
    expect((await sharp(Buffer.from(await thumb.arrayBuffer())).metadata()).format).toBe('webp');

    actAs(world.users.viewer.id);
    expect((await (await api.photos(ws, templateId)).json()).photos).toHaveLength(1);
  });

  it('refuses a text file named .png with 415 and says why', async () => {
    const response = await api.upload(ws, templateId, new Blob(['just some notes, not an image'], { type: 'image/png' }), 'flywheel.png');
    expect(response.status).toBe(415);
    const body = await response.json();
    expect(body.error).toMatch(/not a JPEG, PNG or WebP image \(checked by its content/);
    expect(body.issues[0].path).toBe('photo');
    expect(storedFiles()).toEqual([]);
  });

  it('refuses a file whose signature is PNG but whose content is not an image', async () => {
    const fake = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.from('garbage')]);
    expect((await api.upload(ws, templateId, new Blob([new Uint8Array(fake)]), 'x.png')).status).toBe(415);
  });

  it('strips metadata: a JPEG with EXIF (camera, orientation) is stored without any, turned upright', async () => {
    // 40 × 20 pixels with EXIF orientation 6 (rotate 90° clockwise to view: TIFF/EXIF 2.3 tag 0x0112).
    const withExif = await sharp({ create: { width: 40, height: 20, channels: 3, background: '#3060c0' } })
      .jpeg()
      .withMetadata({ orientation: 6 })
      .withExif({ IFD0: { Make: 'Invented Camera Co', Copyright: 'Someone' } })
      .toBuffer();
    const input = await sharp(withExif).metadata();
    expect(input.exif).toBeDefined();
    expect(input.orientation).toBe(6);
    expect(withExif.includes(Buffer.from('Invented Camera Co'))).toBe(true);

    const response = await api.upload(ws, templateId, new Blob([new Uint8Array(withExif)]), 'camera.jpeg');
    expect(response.status).toBe(201);
    const { photo } = await response.json();
    expect(photo).toMatchObject({ contentType: 'image/jpeg', widthPx: 20, heightPx: 40 });

    const [stored] = storedFiles().filter((f) => f.endsWith('.jpg'));
    const bytes = fs.readFileSync(stored!);
    const meta = await sharp(bytes).metadata();
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(meta.icc).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
    // No APP1 (EXIF/XMP) segment at all: JPEG marker FF E1, ITU-T T.81 Table B.1.
    expect(bytes.includes(Buffer.from('Exif\0\0'))).toBe(false);
    expect(bytes.includes(Buffer.from('Invented Camera Co'))).toBe(false);
  });

  it('refuses an 11 MB file with 413 and stores nothing', async () => {
    const big = Buffer.alloc(11 * 1024 * 1024, 0);
    (await png()).copy(big);
    const response = await api.upload(ws, templateId, new Blob([new Uint8Array(big)]), 'big.png');
    expect(response.status).toBe(413);
    expect((await response.json()).error).toMatch(/larger than 10 MB/);
    expect(storedFiles()).toEqual([]);
  });

  it('refuses an upload declared larger than 10 MB before reading it', async () => {
    const response = await api.upload(ws, templateId, new Blob([new Uint8Array(await png())]), 'p.png', {
      'content-length': String(12 * 1024 * 1024),
    });
    expect(response.status).toBe(413);
  });

  it('lets a viewer see photos but not upload or delete them', async () => {
    const { photo } = await (await api.upload(ws, templateId, new Blob([new Uint8Array(await png())]), 'p.png')).json();
    actAs(world.users.viewer.id);
    expect((await api.upload(ws, templateId, new Blob([new Uint8Array(await png())]), 'p.png')).status).toBe(403);
    expect((await api.deletePhoto(ws, templateId, photo.id)).status).toBe(403);
    expect((await api.photo(ws, templateId, photo.id)).status).toBe(200);
    actAs(world.users.outsider.id);
    expect((await api.photo(ws, templateId, photo.id)).status).toBe(404);
  });

  it('deletes a photo’s files with it, and all photos with their template', async () => {
    const first = (await (await api.upload(ws, templateId, new Blob([new Uint8Array(await png())]), 'a.png')).json()).photo;
    await api.upload(ws, templateId, new Blob([new Uint8Array(await png())]), 'b.png');
    expect(storedFiles()).toHaveLength(4);
    expect((await api.deletePhoto(ws, templateId, first.id)).status).toBe(204);
    expect(storedFiles()).toHaveLength(2);
    actAs(world.users.owner.id);
    expect((await api.delete(ws, templateId)).status).toBe(204);
    expect(storedFiles()).toEqual([]);
    const counted = await world.knex('template_photos').count({ n: "*" });
    const n = counted[0]?.n;
    expect(Number(n)).toBe(0);
  });
});
