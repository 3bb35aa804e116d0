import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { ListObjectsV2Command } from '@aws-sdk/client-s3';
import sharp from 'sharp';
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { useS3Fake } from '@/tests/support/s3-fake';
import { api, SAMPLE } from '../../templates-support';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest({ actingAs: 'technician' });
let fake: Awaited<ReturnType<typeof useS3Fake>>;
let uploadDir: string;

beforeAll(async () => {
  fake = await useS3Fake();
  // A disk folder that must stay empty while S3 is configured.
  uploadDir = fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-uploads-'));
  process.env.RIMSCALE_UPLOAD_DIR = uploadDir;
});
afterAll(async () => {
  await fake.stop();
  delete process.env.RIMSCALE_UPLOAD_DIR;
  fs.rmSync(uploadDir, { recursive: true, force: true });
});

let templateId: number;
beforeEach(async () => {
  templateId = (await (await api.create(world.shop.slug, SAMPLE)).json()).template.id;
});

async function bucketKeys(): Promise<string[]> {
  const listed = await fake.client.send(new ListObjectsV2Command({ Bucket: fake.bucket, Prefix: `templates/${templateId}/` }));
  return (listed.Contents ?? []).map((o) => o.Key!).sort();
}

describe('template photos on S3-compatible storage', () => {
  it('stores the photo and its thumbnail in the bucket, serves them back, and deletes them with the photo', async () => {
    const png = await sharp({ create: { width: 80, height: 60, channels: 3, background: { r: 20, g: 90, b: 200 } } }).png().toBuffer();
    const response = await api.upload(world.shop.slug, templateId, new Blob([new Uint8Array(png)], { type: 'image/png' }), 'pointer.png');
    expect(response.status).toBe(201);
    const { photo } = await response.json();

    const keys = await bucketKeys();
    expect(keys).toHaveLength(2);
    expect(keys.some((k) => k.endsWith('.png'))).toBe(true);
    expect(keys.some((k) => k.endsWith('-thumb.webp'))).toBe(true);
    expect(fs.readdirSync(uploadDir)).toEqual([]);

    const served = await api.photo(world.shop.slug, templateId, photo.id);
    expect(served.status).toBe(200);
    // Decoded by sharp (libvips), independently of how it was stored.
    const meta = await sharp(Buffer.from(await served.arrayBuffer())).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['png', 80, 60]);
    const thumb = await api.photo(world.shop.slug, templateId, photo.id, 'thumb');
    expect((await sharp(Buffer.from(await thumb.arrayBuffer())).metadata()).format).toBe('webp');

    expect((await api.deletePhoto(world.shop.slug, templateId, photo.id)).status).toBe(204);
    expect(await bucketKeys()).toEqual([]);
  });
});
