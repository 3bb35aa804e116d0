import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { POST as confirmReset } from '@/app/api/v1/account/password-reset/confirm/route';
import { POST as requestReset } from '@/app/api/v1/account/password-reset/route';
import { POST as signUpRoute } from '@/app/api/v1/account/sign-up/route';
import { authOptions } from '@/app/lib/auth-options';
import { runWithSocketPeer } from '@/app/lib/client-address';
import { RATE_LIMITED_CODE, signInWithPassword } from '@/app/lib/password-sign-in';
import { resetAllLimits } from '@/app/lib/rate-limit';
import { TABLES } from '@/db/tables';
import { SIGN_IN_REFUSED, signInErrorMessage } from '@/lib/sign-in-messages';
import { WORLD_PASSWORD } from '@/tests/support/access-world';
import { callRoute } from '@/tests/support/call-route';
import { useAccessWorldPerTest, useMailFakeForFile } from '@/tests/support/route-test-hooks';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const PASSWORD = 'plain-text-marker-71-correct';

const mail = useMailFakeForFile();
const world = useAccessWorldPerTest();
const consoleCalls: unknown[][] = [];
beforeEach(async () => {
  await resetAllLimits();
  consoleCalls.length = 0;
  for (const level of ['log', 'info', 'warn', 'error', 'debug'] as const) {
    vi.spyOn(console, level).mockImplementation((...args: unknown[]) => void consoleCalls.push(args));
  }
});
afterEach(() => {
  vi.restoreAllMocks();
});

/** Everything stored or said that could leak a password: every table's rows, console output, mail. */
async function everythingWritten(): Promise<string> {
  const tables = await Promise.all(Object.values(TABLES).map((t) => world.knex(t).select('*')));
  return JSON.stringify({ tables, console: consoleCalls.map((c) => c.map(String)), mail: await mail.inbox() });
}

describe('passwords', () => {
  it('are stored only as a bcrypt hash, and never logged or mailed, through sign-up, sign-in and reset', async () => {
    const email = 'clear@world.test';
    const signedUp = await callRoute(signUpRoute, { body: { name: 'Clear Test', email, password: PASSWORD } });
    expect(signedUp.status).toBe(201);
    const row = await world.knex(TABLES.users).where({ email }).first();
    // bcrypt's modular crypt format: $2a$/$2b$, two-digit cost, 53 characters of salt and hash.
    expect(row.password_hash).toMatch(/^\$2[aby]\$\d{2}\$[./A-Za-z0-9]{53}$/);
    expect(row.password_hash).not.toContain(PASSWORD);

    expect(await signInWithPassword({ email, password: PASSWORD }, 'local')).toMatchObject({ email });
    expect(await signInWithPassword({ email, password: `${PASSWORD}-wrong` }, 'local')).toBeNull();

    await callRoute(requestReset, { body: { email } });
    const link = (await mail.inbox(email)).flatMap((m) => m.links).find((l) => l.includes('/reset-password/confirm'))!;
    const newPassword = 'second-marker-password-93';
    await callRoute(confirmReset, { body: { token: new URL(link).searchParams.get('token'), password: newPassword } });
    expect(await signInWithPassword({ email, password: newPassword }, 'local')).toMatchObject({ email });

    const written = await everythingWritten();
    expect(written).not.toContain(PASSWORD);
    expect(written).not.toContain(newPassword);
  });

  it('are refused by field when too short or over bcrypt’s 72 bytes', async () => {
    const short = await callRoute(signUpRoute, { body: { name: 'S', email: 's@world.test', password: 'short' } });
    expect(short.json.issues).toEqual([{ path: 'password', message: 'Password must be at least 10 characters' }]);
    const long = await callRoute(signUpRoute, { body: { name: 'L', email: 'l@world.test', password: 'é'.repeat(40) } });
    expect(long.json.issues).toEqual([{ path: 'password', message: expect.stringContaining('at most 72 bytes') }]);
  });
});

describe('sign-in', () => {
  it('refuses an unknown address and a wrong password alike: both null, one message', async () => {
    const unknown = await signInWithPassword({ email: 'nobody@world.test', password: WORLD_PASSWORD }, 'local');
    const wrong = await signInWithPassword({ email: world.users.viewer.email, password: 'not the password' }, 'local');
    expect(unknown).toBeNull();
    expect(wrong).toBeNull();
    // next-auth reports both as CredentialsSignin; the page shows one sentence for it.
    expect(signInErrorMessage('CredentialsSignin')).toBe(SIGN_IN_REFUSED);
    expect(SIGN_IN_REFUSED).not.toMatch(/no account|not found|unknown|exist/i);
    // Both leave the same trace (one refusal row each), so neither costs different work.
    const refusals = await world.knex(TABLES.auditLog).where({ action: 'sign-in-refused' }).orderBy('id');
    expect(refusals.map((r) => r.actor_user_id)).toEqual([null, world.users.viewer.id]);
  });

  it('accepts the address in any case and with spaces around it', async () => {
    const user = await signInWithPassword({ email: '  VIEWER@World.Test ', password: WORLD_PASSWORD }, 'local');
    expect(user).toEqual({ id: String(world.users.viewer.id), email: 'viewer@world.test', name: 'World viewer', sessionVersion: 0 });
  });

  it('records sign-ins in the audit log with the address, never the password', async () => {
    await signInWithPassword({ email: world.users.owner.email, password: WORLD_PASSWORD }, '198.51.100.4');
    const rows = await world.knex(TABLES.auditLog).where({ action: 'sign-in' });
    expect(rows).toHaveLength(1);
    expect(rows[0].actor_user_id).toBe(world.users.owner.id);
    expect(JSON.parse(rows[0].detail)).toEqual({ address: '198.51.100.4' });
  });

  it('locks an account for one client address after 5 failed attempts, not for the owner elsewhere', async () => {
    // Issue 11, hole 7: five wrong passwords from an attacker's address (RFC 5737 documentation ranges).
    const { email } = world.users.technician;
    for (let i = 0; i < 5; i++) expect(await signInWithPassword({ email, password: 'wrong password' }, '203.0.113.66')).toBeNull();
    // The sixth, from the same address, is refused even with the right password…
    await expect(signInWithPassword({ email, password: WORLD_PASSWORD }, '203.0.113.66')).rejects.toThrow(RATE_LIMITED_CODE);
    // …and a sixth wrong one from a second address does not lock the owner at the first (their own) address out.
    expect(await signInWithPassword({ email, password: 'wrong password' }, '198.51.100.77')).toBeNull();
    expect(await signInWithPassword({ email, password: WORLD_PASSWORD }, '192.0.2.10')).not.toBeNull();
  });

  it('counts the socket address, so rotating a forged X-Forwarded-For does not escape the limit (issue 11, hole 4)', async () => {
    type Authorize = (credentials: unknown, req: { headers: Record<string, string> }) => Promise<unknown>;
    const provider = authOptions.providers[0] as unknown as { options: { authorize: Authorize } };
    const { email } = world.users.technician;
    const attempt = (password: string, i: number) =>
      runWithSocketPeer('203.0.113.9', () => provider.options.authorize({ email, password }, { headers: { 'x-forwarded-for': `198.51.100.${i}` } }));
    for (let i = 0; i < 5; i++) expect(await attempt('wrong password', i)).toBeNull();
    await expect(attempt(WORLD_PASSWORD, 99)).rejects.toThrow(RATE_LIMITED_CODE);
  });

  it('still caps one account at 100 failures an hour spread over many addresses', async () => {
    const { email } = world.users.technician;
    for (let i = 0; i < 100; i++) await signInWithPassword({ email, password: 'wrong' }, `10.0.${Math.floor(i / 4)}.${i % 4}`);
    await expect(signInWithPassword({ email, password: WORLD_PASSWORD }, '192.0.2.99')).rejects.toThrow(RATE_LIMITED_CODE);
    // Another account is not affected.
    expect(await signInWithPassword({ email: world.users.viewer.email, password: WORLD_PASSWORD }, '192.0.2.99')).not.toBeNull();
  });

  it('limits one client address to 30 failed attempts across any accounts', async () => {
    for (let i = 0; i < 30; i++) {
      await signInWithPassword({ email: `guess-${i}@world.test`, password: 'guess' }, '203.0.113.50');
    }
    await expect(signInWithPassword({ email: world.users.owner.email, password: WORLD_PASSWORD }, '203.0.113.50')).rejects.toThrow(
      RATE_LIMITED_CODE,
    );
    expect(await signInWithPassword({ email: world.users.owner.email, password: WORLD_PASSWORD }, '203.0.113.51')).not.toBeNull();
  });

  it('forgets earlier failures of an account after a successful sign-in', async () => {
    const { email } = world.users.viewer;
    for (let i = 0; i < 4; i++) await signInWithPassword({ email, password: 'wrong' }, 'local');
    expect(await signInWithPassword({ email, password: WORLD_PASSWORD }, 'local')).not.toBeNull();
    for (let i = 0; i < 4; i++) await signInWithPassword({ email, password: 'wrong' }, 'other');
    expect(await signInWithPassword({ email, password: WORLD_PASSWORD }, 'other')).not.toBeNull();
  });
});
