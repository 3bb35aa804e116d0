import { beforeEach, describe, expect, it, vi } from 'vitest';
import { POST as requestReset } from '@/app/api/v1/account/password-reset/route';
import { POST as signUpRoute } from '@/app/api/v1/account/sign-up/route';
import { POST as resendRoute } from '@/app/api/v1/account/verify-email/resend/route';
import { POST as inviteRoute } from '@/app/api/v1/workspaces/[workspace]/invitations/route';
import { runWithSocketPeer } from '@/app/lib/client-address';
import { resetAllLimits } from '@/app/lib/rate-limit';
import { callRoute } from '@/tests/support/call-route';
import { useAccessWorldPerTest, useMailFakeForFile } from '@/tests/support/route-test-hooks';
import { actAs } from '@/tests/support/session';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const mail = useMailFakeForFile();
const world = useAccessWorldPerTest();
beforeEach(() => resetAllLimits());

// Client addresses from the documentation ranges of RFC 5737.
const from = <T>(address: string, call: () => Promise<T>) => runWithSocketPeer(address, call);

describe('confirmation mail to an address the requester may not own (issue 11, hole 5)', () => {
  it('sends at most 3 an hour to the target however often resend is asked, with the name cut to plain text', async () => {
    const victim = 'victim@elsewhere.test';
    const name = 'Win a prize at http://prize.example now';
    const signedUp = await from('203.0.113.5', () => callRoute(signUpRoute, { body: { name, email: victim, password: 'a long password' } }));
    expect(signedUp.status).toBe(201);
    actAs(signedUp.json.userId as number);
    const statuses: number[] = [];
    // 50 resends, as in the attack, each from a different client address.
    for (let i = 0; i < 50; i++) statuses.push((await from(`203.0.113.${10 + i}`, () => callRoute(resendRoute))).status);
    const mailed = await mail.inbox(victim);
    expect(mailed.length).toBeLessThanOrEqual(3);
    expect(statuses.filter((s) => s === 202)).toHaveLength(2);
    expect(statuses.slice(2).every((s) => s === 429)).toBe(true);
    // The chosen name is a link, so the greeting leaves it out.
    for (const message of mailed) {
      expect(message.text.split(/\r?\n/)[0]).toBe('Hello,');
      expect(message.text).not.toContain('prize.example');
    }
  });

  it('caps a long name in the greeting', async () => {
    const name = `Eldrun ${'Haverstock-'.repeat(6)}Quill`;
    await callRoute(signUpRoute, { body: { name, email: 'eldrun@world.test', password: 'a long password' } });
    const [message] = await mail.inbox('eldrun@world.test');
    const greeting = message!.text.split(/\r?\n/)[0]!;
    expect(Array.from(greeting.replace(/^Hello /, '').replace(/,$/, '')).length).toBeLessThanOrEqual(40);
    expect(greeting).toMatch(/…,$/);
  });
});

describe('reset links', () => {
  it('reach one address at most 3 times an hour, whichever client addresses ask', async () => {
    const { email } = world.users.technician;
    const statuses: number[] = [];
    for (let i = 0; i < 12; i++) statuses.push((await from(`198.51.100.${i}`, () => callRoute(requestReset, { body: { email } }))).status);
    expect(statuses.slice(0, 3)).toEqual([202, 202, 202]);
    expect(statuses.slice(3).every((s) => s === 429)).toBe(true);
    expect((await mail.inbox(email)).length).toBe(3);
  });
});

describe('invitations', () => {
  it('are limited to 20 per workspace per day', async () => {
    actAs(world.users.owner.id);
    const statuses: number[] = [];
    for (let i = 0; i < 22; i++) {
      const sent = await callRoute(inviteRoute, { params: { workspace: world.shop.slug }, body: { email: `guest-${i}@elsewhere.test`, role: 'viewer' } });
      statuses.push(sent.status);
    }
    expect(statuses.filter((s) => s === 201)).toHaveLength(20);
    expect(statuses.slice(20)).toEqual([429, 429]);
    expect(await world.knex('invitations').count({ n: '*' })).toEqual([{ n: 20 }]);
  });

  it('reach one address at most 3 times a day', async () => {
    actAs(world.users.owner.id);
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++)
      statuses.push((await callRoute(inviteRoute, { params: { workspace: world.shop.slug }, body: { email: 'same@elsewhere.test', role: 'viewer' } })).status);
    expect(statuses).toEqual([201, 201, 201, 429]);
  });
});
