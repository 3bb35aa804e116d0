import 'server-only';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { clearAllLimits, databaseLimiter } from './rate-limit-store';

/** Limits shared by every app instance: the counters live in the database (rate-limit-store.ts). */
const LIMITS = {
  signInPerAccount: { points: 5, duration: 15 * 60 },
  signInPerAddress: { points: 30, duration: 15 * 60 },
  resetPerAccount: { points: 3, duration: 60 * 60 },
  resetPerAddress: { points: 10, duration: 60 * 60 },
  // Sign-up says when an address already has an account, so it is limited like a guess.
  signUpPerAddress: { points: 20, duration: 60 * 60 },
} as const;

export type LimitName = keyof typeof LIMITS;

function limiters(): Record<LimitName, ReturnType<typeof databaseLimiter>> {
  const entries = Object.entries(LIMITS).map(([name, opts]) => [name, databaseLimiter({ keyPrefix: name, ...opts })]);
  return Object.fromEntries(entries) as Record<LimitName, ReturnType<typeof databaseLimiter>>;
}

export class RateLimitedError extends Error {
  constructor(public retryAfterSeconds: number) {
    super(`Too many attempts. Wait ${Math.ceil(retryAfterSeconds / 60)} minute(s) and try again.`);
    this.name = 'RateLimitedError';
  }
}

/** Throws RateLimitedError if any of the keys has used up its points; consumes nothing. */
export async function assertNotLimited(checks: [LimitName, string][]): Promise<void> {
  for (const [name, key] of checks) {
    const res = await limiters()[name].get(key);
    if (res && res.remainingPoints <= 0) throw new RateLimitedError(res.msBeforeNext / 1000);
  }
}

/** Uses one point of each key; throws RateLimitedError when one is over its limit. */
export async function consumePoint(checks: [LimitName, string][]): Promise<void> {
  for (const [name, key] of checks) {
    try {
      await limiters()[name].consume(key);
    } catch (err) {
      if (err instanceof RateLimiterRes) throw new RateLimitedError(err.msBeforeNext / 1000);
      throw err;
    }
  }
}

export async function forgetKey(name: LimitName, key: string): Promise<void> {
  await limiters()[name].delete(key);
}

/** Tests start each case with fresh limits. */
export async function resetAllLimits(): Promise<void> {
  await clearAllLimits();
}

/**
 * The client address as the nearest proxy reports it. Without a trusted proxy the header
 * can be forged, which is why every limit also applies per account.
 */
export function clientAddress(headers: Headers | Record<string, string | string[] | undefined>): string {
  const get = (name: string) => (headers instanceof Headers ? headers.get(name) : [headers[name]].flat()[0]) ?? '';
  return get('x-forwarded-for').split(',')[0]?.trim() || get('x-real-ip').trim() || 'local';
}
