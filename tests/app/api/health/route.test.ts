import { afterEach, describe, expect, it } from 'vitest';
import { closeDb } from '@/db/knex';
import { GET } from '@/app/api/health/route';
import { createTempDb } from '@/tests/support/temp-db';

let cleanup: (() => Promise<void>) | undefined;
afterEach(async () => {
  await closeDb();
  await cleanup?.();
  cleanup = undefined;
});

async function healthWith(options: { migrate: boolean }) {
  const temp = await createTempDb(options);
  cleanup = temp.cleanup;
  temp.useInApp();
  const response = await GET();
  return { status: response.status, body: await response.json() };
}

describe('GET /api/health', () => {
  it('answers 200 with the migration count when the database is migrated', async () => {
    const { status, body } = await healthWith({ migrate: true });
    expect(status).toBe(200);
    expect(body.status).toBe('ok');
    expect(body.database.migrations).toBeGreaterThan(0);
  });

  it('answers 503 with a reason when migrations are pending', async () => {
    const { status, body } = await healthWith({ migrate: false });
    expect(status).toBe(503);
    expect(body.database.ok).toBe(false);
    expect(body.database.reason).toMatch(/pending/);
  });
});
