import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { GetObjectCommand, HeadObjectCommand } from '@aws-sdk/client-s3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deleteObject, getObject, putObject } from '@/app/lib/storage';
import { useS3Fake } from '@/tests/support/s3-fake';

type Backend = { name: string; start: () => Promise<{ stored: (key: string) => Promise<Buffer | null>; stop: () => Promise<void> }> };

const BACKENDS: Backend[] = [
  {
    name: 'local disk',
    start: async () => {
      const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-store-'));
      process.env.RIMSCALE_UPLOAD_DIR = dir;
      return {
        stored: async (key) => (fs.existsSync(path.join(dir, key)) ? fs.readFileSync(path.join(dir, key)) : null),
        stop: async () => {
          delete process.env.RIMSCALE_UPLOAD_DIR;
          fs.rmSync(dir, { recursive: true, force: true });
        },
      };
    },
  },
  {
    name: 'the S3 fake',
    start: async () => {
      const fake = await useS3Fake({ prefix: 'shop-a' });
      return {
        // Read back with a client of the test's own, under the configured prefix.
        stored: async (key) => {
          try {
            const answer = await fake.client.send(new GetObjectCommand({ Bucket: fake.bucket, Key: `shop-a/${key}` }));
            return Buffer.from(await answer.Body!.transformToByteArray());
          } catch {
            return null;
          }
        },
        stop: fake.stop,
      };
    },
  },
];

describe.each(BACKENDS)('storage on $name', (backend) => {
  let running: Awaited<ReturnType<Backend['start']>>;
  beforeAll(async () => {
    running = await backend.start();
  });
  afterAll(async () => running.stop());

  it('keeps the exact bytes under a key and answers them back', async () => {
    const bytes = Buffer.from([0, 1, 2, 254, 255, 0x89, 0x50, 0x4e, 0x47]);
    await putObject('templates/7/photo-a.png', bytes, 'image/png');
    expect(await getObject('templates/7/photo-a.png')).toEqual(bytes);
    expect(await running.stored('templates/7/photo-a.png')).toEqual(bytes);
  });

  it('answers null for a key never stored, and after a delete', async () => {
    expect(await getObject('templates/7/never.png')).toBeNull();
    await putObject('templates/7/gone.webp', Buffer.from('thumb'));
    await deleteObject('templates/7/gone.webp');
    expect(await getObject('templates/7/gone.webp')).toBeNull();
    expect(await running.stored('templates/7/gone.webp')).toBeNull();
    await expect(deleteObject('templates/7/gone.webp')).resolves.toBeUndefined();
  });

  it('refuses keys outside the allowed pattern before touching the store', async () => {
    for (const key of ['../escape.png', 'templates/../x.png', 'Upper.png', '/absolute.png', 'a//b.png']) {
      await expect(putObject(key, Buffer.from('x')), key).rejects.toThrow(/Invalid storage key/);
    }
  });
});

describe('storage on the S3 fake', () => {
  it('stores the content type it is given, so the bucket can serve the file itself', async () => {
    const fake = await useS3Fake();
    try {
      await putObject('templates/1/p.jpg', Buffer.from([0xff, 0xd8, 0xff]), 'image/jpeg');
      const head = await fake.client.send(new HeadObjectCommand({ Bucket: fake.bucket, Key: 'templates/1/p.jpg' }));
      expect(head.ContentType).toBe('image/jpeg');
      expect(head.ContentLength).toBe(3);
    } finally {
      await fake.stop();
    }
  });
});
