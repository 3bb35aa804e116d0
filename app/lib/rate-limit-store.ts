import 'server-only';
import type { Knex } from 'knex';
import { RateLimiterPostgres, RateLimiterSQLite, type RateLimiterStoreAbstract } from 'rate-limiter-flexible';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';

export type LimitOptions = { keyPrefix: string; points: number; duration: number };

/** Limiters per database instance: tests and scripts may point db() elsewhere. */
const made = new WeakMap<Knex, Map<string, RateLimiterStoreAbstract>>();

/**
 * A limiter whose counters live in the app's database (table rate_limits, made by a
 * migration), so every instance behind a load balancer counts together and a restart
 * forgets nothing. The one place that decides where limit counters are kept.
 */
export function databaseLimiter(options: LimitOptions): RateLimiterStoreAbstract {
  const knex = db();
  const mine = made.get(knex) ?? new Map<string, RateLimiterStoreAbstract>();
  made.set(knex, mine);
  const id = `${options.keyPrefix}:${options.points}:${options.duration}`;
  let limiter = mine.get(id);
  if (!limiter) {
    const store = { ...options, storeClient: knex, storeType: 'knex', tableName: TABLES.rateLimits, tableCreated: true };
    const postgres = (knex.client as { dialect?: string }).dialect === 'postgresql';
    limiter = postgres ? new RateLimiterPostgres(store) : new RateLimiterSQLite(store);
    mine.set(id, limiter);
  }
  return limiter;
}

/** Forgets every counter (tests start each case with fresh limits). */
export async function clearAllLimits(): Promise<void> {
  await db()(TABLES.rateLimits).del();
}
