import 'server-only';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { clearAllLimits, databaseLimiter } from './rate-limit-store';

const MINUTE = 60;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

/**
 * Every limit the app applies: its points per window. The keys each caller passes say what is
 * counted (an account, a target e-mail address, a client address from client-address.ts,
 * a workspace). The counters live in the database (rate-limit-store.ts): shared by every app
 * instance and kept across restarts.
 */
const LIMITS = {
  // Wrong passwords. Per account *and* client address, so an attacker elsewhere cannot lock the
  // owner out; per client address against one address guessing many accounts; per account a
  // much higher ceiling against a guesser spread over many addresses.
  signInPerAccountAndAddress: { points: 5, duration: 15 * MINUTE },
  signInPerAddress: { points: 30, duration: 15 * MINUTE },
  signInPerAccount: { points: 100, duration: HOUR },
  // Reset links: per target address (the account's), per account and per client.
  resetPerTarget: { points: 3, duration: HOUR },
  resetPerAccount: { points: 3, duration: HOUR },
  resetPerAddress: { points: 10, duration: HOUR },
  // Address confirmations: the sign-up's own mail counts against the target, then resends.
  verifyMailPerTarget: { points: 3, duration: HOUR },
  verifyMailPerAccount: { points: 3, duration: HOUR },
  verifyMailPerAddress: { points: 20, duration: HOUR },
  // Invitations: per workspace per day, and per invited address per day across workspaces.
  invitePerWorkspace: { points: 20, duration: DAY },
  invitePerTarget: { points: 3, duration: DAY },
  // Sign-up says when an address already has an account, so it is limited like a guess.
  signUpPerAddress: { points: 20, duration: HOUR },
  // A shop mails customers their copies; more than this an hour looks like a loop or abuse of the mailer.
  buildSendPerWorkspace: { points: 30, duration: HOUR },
} as const;

export type LimitName = keyof typeof LIMITS;

/** The limiters, built by rate-limit-store.ts (the one place that chooses their store). */
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

/**
 * Uses one point of each key; throws RateLimitedError when one is over its limit. Every key
 * is charged even when an earlier one refuses, so no limit can be dodged by tripping another.
 */
export async function consumePoint(checks: [LimitName, string][]): Promise<void> {
  let refusal: RateLimitedError | undefined;
  for (const [name, key] of checks) {
    try {
      await limiters()[name].consume(key);
    } catch (err) {
      if (!(err instanceof RateLimiterRes)) throw err;
      if (!refusal || err.msBeforeNext / 1000 > refusal.retryAfterSeconds) refusal = new RateLimitedError(err.msBeforeNext / 1000);
    }
  }
  if (refusal) throw refusal;
}

export async function forgetKey(name: LimitName, key: string): Promise<void> {
  await limiters()[name].delete(key);
}

/** Tests start each case with fresh limits. */
export async function resetAllLimits(): Promise<void> {
  await clearAllLimits();
}
