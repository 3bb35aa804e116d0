import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { clearAllLimits, databaseLimiter } from '@/app/lib/rate-limit-store';
import { closeDb } from '@/db/knex';
import { TABLES } from '@/db/tables';
import { createTempDb, type TempDb } from '@/tests/support/temp-db';

let temp: TempDb;
beforeEach(async () => {
  await closeDb();
  temp = await createTempDb();
  temp.useInApp();
});
afterEach(async () => {
  await closeDb();
  await temp.cleanup();
});

const LIMIT = { keyPrefix: 'testLimit', points: 3, duration: 60 };

describe('rate-limit counters in the database', () => {
  it('keeps the count in the rate_limits table, so a new connection pool (a restart, another instance) sees it', async () => {
    for (let i = 0; i < 3; i++) await databaseLimiter(LIMIT).consume('someone@example.test');
    const rows = await temp.knex(TABLES.rateLimits).select('key', 'points');
    expect(rows).toEqual([{ key: 'testLimit:someone@example.test', points: 3 }]);

    await closeDb(); // the next db() is a new pool, as in another process
    const res = await databaseLimiter(LIMIT).get('someone@example.test');
    expect(res?.remainingPoints).toBe(0);
    await expect(databaseLimiter(LIMIT).consume('someone@example.test')).rejects.toBeInstanceOf(RateLimiterRes);
    expect((await databaseLimiter(LIMIT).get('someone-else@example.test'))).toBeNull();
  });

  it('counts concurrent uses of one key without losing a point', async () => {
    await Promise.all(Array.from({ length: 3 }, () => databaseLimiter(LIMIT).consume('busy')));
    const outcomes = await Promise.allSettled(Array.from({ length: 4 }, () => databaseLimiter({ ...LIMIT, points: 6 }).consume('busy')));
    // 3 + 4 = 7 points against a limit of 6: exactly one is refused.
    expect(outcomes.filter((o) => o.status === 'rejected')).toHaveLength(1);
    expect((await temp.knex(TABLES.rateLimits).where('key', 'testLimit:busy').first()).points).toBe(7);
  });

  it('starts over when the window has passed, and clearAllLimits forgets every counter', async () => {
    await databaseLimiter(LIMIT).consume('late');
    await temp.knex(TABLES.rateLimits).update({ expire: Date.now() - 1000 });
    const res = await databaseLimiter(LIMIT).consume('late');
    expect(res.consumedPoints).toBe(1);
    await clearAllLimits();
    expect(await temp.knex(TABLES.rateLimits).count({ n: '*' })).toEqual([{ n: 0 }]);
  });
});
