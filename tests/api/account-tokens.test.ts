import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { runWithSocketPeer } from '@/app/lib/client-address';
import { POST as requestReset } from '@/app/api/v1/account/password-reset/route';
import { POST as confirmReset } from '@/app/api/v1/account/password-reset/confirm/route';
import { POST as signUpRoute } from '@/app/api/v1/account/sign-up/route';
import { POST as verifyRoute } from '@/app/api/v1/account/verify-email/route';
import { POST as acceptRoute } from '@/app/api/v1/invitations/accept/route';
import { POST as inviteRoute } from '@/app/api/v1/workspaces/[workspace]/invitations/route';
import { hashToken } from '@/db/token-hash';
import { TOKEN_REFUSAL_MESSAGES } from '@/lib/one-time-token';
import { resetAllLimits } from '@/app/lib/rate-limit';
import { TABLES } from '@/db/tables';
import { callRoute } from '@/tests/support/call-route';
import { useAccessWorldPerTest, useMailFakeForFile } from '@/tests/support/route-test-hooks';
import { actAs } from '@/tests/support/session';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const mail = useMailFakeForFile();
const world = useAccessWorldPerTest();
beforeEach(() => resetAllLimits());
afterEach(() => {
  vi.useRealTimers();
});

/** The token of the newest link mailed to `to` whose path contains `path`, read over the fake's HTTP API. */
async function tokenMailedTo(to: string, path: string): Promise<string> {
  const messages = await mail.inbox(to);
  const link = messages.flatMap((m) => m.links).reverse().find((l) => l.includes(path));
  expect(link, `a ${path} link mailed to ${to}`).toBeTruthy();
  return new URL(link!).searchParams.get('token')!;
}

/** Only Date is faked, so SMTP sockets and timers keep running. */
function moveClock(ms: number) {
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(Date.now() + ms);
}

const HOUR = 60 * 60 * 1000;

describe('password reset links', () => {
  it('work once, and a second use is refused with a clear message', async () => {
    const { email } = world.users.viewer;
    expect((await callRoute(requestReset, { body: { email } })).status).toBe(202);
    const token = await tokenMailedTo(email, '/reset-password/confirm');
    const first = await callRoute(confirmReset, { body: { token, password: 'a fresh long password' } });
    expect(first.status).toBe(200);
    // The reset ends the account's older sessions (app/lib/session.ts compares this version).
    expect((await world.knex(TABLES.users).where({ email }).first()).session_version).toBe(1);
    const again = await callRoute(confirmReset, { body: { token, password: 'another long password' } });
    expect(again.status).toBe(400);
    expect(again.json.error).toBe(TOKEN_REFUSAL_MESSAGES.used);
  });

  it('expire after one hour (fake clock)', async () => {
    const { email } = world.users.viewer;
    await callRoute(requestReset, { body: { email } });
    const token = await tokenMailedTo(email, '/reset-password/confirm');
    moveClock(HOUR + 1000);
    const late = await callRoute(confirmReset, { body: { token, password: 'a fresh long password' } });
    expect(late.status).toBe(400);
    expect(late.json.error).toBe(TOKEN_REFUSAL_MESSAGES.expired);
  });

  it('still work just before the hour is up', async () => {
    const { email } = world.users.viewer;
    await callRoute(requestReset, { body: { email } });
    const token = await tokenMailedTo(email, '/reset-password/confirm');
    moveClock(HOUR - 60_000);
    expect((await callRoute(confirmReset, { body: { token, password: 'a fresh long password' } })).status).toBe(200);
  });

  it('refuse a forged token as not valid, and a malformed one by field', async () => {
    const forged = await callRoute(confirmReset, { body: { token: 'A'.repeat(43), password: 'a fresh long password' } });
    expect(forged.status).toBe(400);
    expect(forged.json.error).toBe(TOKEN_REFUSAL_MESSAGES.unknown);
    const malformed = await callRoute(confirmReset, { body: { token: 'x', password: 'a fresh long password' } });
    expect(malformed.status).toBe(400);
    expect(malformed.json.issues).toEqual([{ path: 'token', message: expect.stringContaining('Link code is not valid') }]);
  });

  it('store only a SHA-256 of the token, never the token', async () => {
    const { email } = world.users.viewer;
    await callRoute(requestReset, { body: { email } });
    const token = await tokenMailedTo(email, '/reset-password/confirm');
    const rows = await world.knex(TABLES.oneTimeTokens).select('*');
    expect(rows).toHaveLength(1);
    expect(JSON.stringify(rows)).not.toContain(token);
    expect(rows[0].token_hash).toBe(hashToken(token));
    expect(rows[0].token_hash).toMatch(/^[0-9a-f]{64}$/);
  });

  it('answer the same for an address without an account, and mail nothing to it', async () => {
    const known = await callRoute(requestReset, { body: { email: world.users.viewer.email } });
    const unknown = await callRoute(requestReset, { body: { email: 'nobody@world.test' } });
    expect(unknown).toEqual(known);
    expect(await mail.inbox('nobody@world.test')).toEqual([]);
  });

  it('are limited to 3 requests per account per hour, then 429 with a clear message', async () => {
    const { email } = world.users.technician;
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await callRoute(requestReset, { body: { email } })).status);
    expect(statuses).toEqual([202, 202, 202, 429]);
    const refused = await callRoute(requestReset, { body: { email } });
    expect(refused.json.error).toMatch(/^Too many attempts\. Wait \d+ minute\(s\) and try again\.$/);
  });

  it('are limited to 10 requests per client address per hour, whatever the addresses asked for', async () => {
    const statuses = [];
    for (let i = 0; i < 11; i++) {
      // One socket peer (TEST-NET-3, RFC 5737) rotating a forged X-Forwarded-For: still one client.
      const headers = { 'x-forwarded-for': `198.51.100.${i}` };
      statuses.push((await runWithSocketPeer('203.0.113.7', () => callRoute(requestReset, { body: { email: `someone-${i}@world.test` }, headers }))).status);
    }
    expect(statuses.slice(0, 10).every((s) => s === 202)).toBe(true);
    expect(statuses[10]).toBe(429);
  });
});

describe('e-mail verification links', () => {
  it('are mailed at sign-up, confirm the address once, then read as used', async () => {
    const signedUp = await callRoute(signUpRoute, { body: { name: 'Nia', email: 'nia@world.test', password: 'a long password' } });
    expect(signedUp.status).toBe(201);
    const token = await tokenMailedTo('nia@world.test', '/verify-email');
    expect((await callRoute(verifyRoute, { body: { token } })).status).toBe(200);
    const row = await world.knex(TABLES.users).where({ email: 'nia@world.test' }).first();
    expect(row.email_verified_at).toBeTruthy();
    const again = await callRoute(verifyRoute, { body: { token } });
    expect([again.status, again.json.error]).toEqual([400, TOKEN_REFUSAL_MESSAGES.used]);
  });

  it('expire after 24 hours', async () => {
    await callRoute(signUpRoute, { body: { name: 'Oli', email: 'oli@world.test', password: 'a long password' } });
    const token = await tokenMailedTo('oli@world.test', '/verify-email');
    moveClock(24 * HOUR + 1000);
    const late = await callRoute(verifyRoute, { body: { token } });
    expect([late.status, late.json.error]).toEqual([400, TOKEN_REFUSAL_MESSAGES.expired]);
  });

  it('sign-ups are limited to 20 per client address per hour, then 429, however X-Forwarded-For rotates', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 21; i++) {
      const body = { name: `N${i}`, email: `n${i}@world.test`, password: 'a long password' };
      const headers = { 'x-forwarded-for': `203.0.113.${i}` }; // forged, rotating (TEST-NET-3, RFC 5737)
      statuses.push((await runWithSocketPeer('198.51.100.20', () => callRoute(signUpRoute, { body, headers }))).status);
    }
    expect(statuses.filter((s) => s === 201)).toHaveLength(20);
    expect(statuses[20]).toBe(429);
  });

  it('give every sign-up a personal workspace it owns', async () => {
    const signedUp = await callRoute(signUpRoute, { body: { name: 'Pim Aalto', email: 'pim@world.test', password: 'a long password' } });
    const rows = await world.knex(TABLES.memberships)
      .join(TABLES.workspaces, `${TABLES.workspaces}.id`, `${TABLES.memberships}.workspace_id`)
      .where(`${TABLES.memberships}.user_id`, signedUp.json.userId as number)
      .select('kind', 'role', 'slug');
    expect(rows).toEqual([{ kind: 'personal', role: 'owner', slug: expect.stringMatching(/^pim-aalto-[0-9a-f]{6}$/) }]);
  });
});

describe('invitation links', () => {
  async function inviteNewcomer(email = 'newcomer@world.test') {
    actAs(world.users.owner.id);
    const sent = await callRoute(inviteRoute, { params: { workspace: world.shop.slug }, body: { email, role: 'technician' } });
    expect(sent.status).toBe(201);
    actAs(null);
    return tokenMailedTo(email, '/invitations/accept');
  }

  it('let the invitee sign up and join with the invited role, once', async () => {
    const token = await inviteNewcomer();
    const signedUp = await callRoute(signUpRoute, {
      body: { name: 'Newcomer', email: 'newcomer@world.test', password: 'a long password', invitationToken: token },
    });
    expect(signedUp.json.verified).toBe(true); // the invitation link proved the mailbox
    actAs(signedUp.json.userId as number);
    const accepted = await callRoute(acceptRoute, { body: { token } });
    expect(accepted).toEqual({ status: 200, json: { workspaceSlug: world.shop.slug, role: 'technician' } });
    const again = await callRoute(acceptRoute, { body: { token } });
    expect([again.status, again.json.error]).toEqual([400, TOKEN_REFUSAL_MESSAGES.used]);
  });

  it('refuse someone signed in with another address, naming the invited one', async () => {
    const token = await inviteNewcomer();
    actAs(world.users.outsider.id);
    const refused = await callRoute(acceptRoute, { body: { token } });
    expect(refused.status).toBe(403);
    expect(refused.json.error).toContain('newcomer@world.test');
    expect(await world.knex(TABLES.memberships).where({ user_id: world.users.outsider.id, workspace_id: world.shop.id })).toEqual([]);
  });

  it('expire after 7 days', async () => {
    const token = await inviteNewcomer('late@world.test');
    const [row] = await world.knex(TABLES.users).insert({ email: 'late@world.test', name: 'Late', password_hash: 'x' }).returning('id');
    moveClock(7 * 24 * HOUR + 1000);
    actAs(row.id);
    const late = await callRoute(acceptRoute, { body: { token } });
    expect([late.status, late.json.error]).toEqual([400, TOKEN_REFUSAL_MESSAGES.expired]);
  });

  it('store only the hash of the token', async () => {
    const token = await inviteNewcomer();
    const rows = await world.knex(TABLES.invitations).select('*');
    expect(JSON.stringify(rows)).not.toContain(token);
    expect(rows[0].token_hash).toBe(hashToken(token));
  });
});
