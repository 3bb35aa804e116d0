import { describe, expect, it, vi } from 'vitest';
import { POST as leaveRoute } from '@/app/api/v1/workspaces/[workspace]/leave/route';
import { DELETE as removeRoute, PATCH as roleRoute } from '@/app/api/v1/workspaces/[workspace]/members/[userId]/route';
import { DELETE as deleteProfileRoute } from '@/app/api/v1/workspaces/[workspace]/printer-profiles/[profileId]/route';
import { GET as listProfilesRoute, POST as addProfileRoute } from '@/app/api/v1/workspaces/[workspace]/printer-profiles/route';
import { POST as inviteRoute } from '@/app/api/v1/workspaces/[workspace]/invitations/route';
import { TABLES } from '@/db/tables';
import { callRoute } from '@/tests/support/call-route';
import { useAccessWorldPerTest, useMailFakeForFile } from '@/tests/support/route-test-hooks';
import { actAs } from '@/tests/support/session';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const mail = useMailFakeForFile();
const world = useAccessWorldPerTest({ actingAs: 'owner' });

const roleOf = async (userId: number) =>
  (await world.knex(TABLES.memberships).where({ user_id: userId, workspace_id: world.shop.id }).first())?.role;

describe('the last owner', () => {
  it('cannot be demoted, with a message saying what to do', async () => {
    const res = await callRoute(roleRoute, {
      method: 'PATCH',
      params: { workspace: world.shop.slug, userId: String(world.users.owner.id) },
      body: { role: 'technician' },
    });
    expect(res.status).toBe(409);
    expect(res.json.error).toBe('Cannot change the role: this is the last owner of World Shop. Make another member owner first.');
    expect(await roleOf(world.users.owner.id)).toBe('owner');
  });

  it('cannot leave or be removed', async () => {
    const left = await callRoute(leaveRoute, { params: { workspace: world.shop.slug } });
    expect([left.status, left.json.error]).toEqual([409, expect.stringContaining('You cannot leave: this is the last owner')]);
    const removed = await callRoute(removeRoute, {
      method: 'DELETE',
      params: { workspace: world.shop.slug, userId: String(world.users.owner.id) },
    });
    expect(removed.status).toBe(409);
    expect(await roleOf(world.users.owner.id)).toBe('owner');
  });

  it('may step down once another member is owner', async () => {
    const promote = await callRoute(roleRoute, {
      method: 'PATCH',
      params: { workspace: world.shop.slug, userId: String(world.users.technician.id) },
      body: { role: 'owner' },
    });
    expect(promote.status).toBe(200);
    const stepDown = await callRoute(roleRoute, {
      method: 'PATCH',
      params: { workspace: world.shop.slug, userId: String(world.users.owner.id) },
      body: { role: 'viewer' },
    });
    expect(stepDown.status).toBe(200);
    expect([await roleOf(world.users.owner.id), await roleOf(world.users.technician.id)]).toEqual(['viewer', 'owner']);
  });
});

describe('owners manage members', () => {
  it('role changes and removals are written to the audit log', async () => {
    await callRoute(roleRoute, {
      method: 'PATCH',
      params: { workspace: world.shop.slug, userId: String(world.users.viewer.id) },
      body: { role: 'technician' },
    });
    await callRoute(removeRoute, { method: 'DELETE', params: { workspace: world.shop.slug, userId: String(world.users.viewer.id) } });
    await callRoute(inviteRoute, { params: { workspace: world.shop.slug }, body: { email: 'joiner@world.test', role: 'viewer' } });
    const rows = await world.knex(TABLES.auditLog).where({ workspace_id: world.shop.id }).orderBy('id');
    expect(rows.map((r) => [r.action, r.actor_user_id, JSON.parse(r.detail)])).toEqual([
      ['role-changed', world.users.owner.id, { userId: world.users.viewer.id, from: 'viewer', to: 'technician' }],
      ['member-removed', world.users.owner.id, { userId: world.users.viewer.id, role: 'technician' }],
      ['invitation-sent', world.users.owner.id, { email: 'joiner@world.test', role: 'viewer' }],
    ]);
    expect(await roleOf(world.users.viewer.id)).toBeUndefined();
  });

  it('the invitation e-mail says until when it is valid, in the inviter\'s language and the stated zone', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-12-01T12:00:00Z'));
    try {
      const res = await callRoute(inviteRoute, {
        params: { workspace: world.shop.slug },
        body: { email: 'dated@world.test', role: 'viewer' },
        headers: { 'accept-language': 'en-GB,en;q=0.8' },
      });
      expect(res.status).toBe(201);
    } finally {
      vi.useRealTimers();
    }
    const [message] = await mail.inbox('dated@world.test');
    // Invitations last 7 days (lib/one-time-token.ts): 1 Dec 12:00 UTC + 7 days, in CLDR en-GB "d MMM y, HH:mm z".
    expect(message?.text).toContain('valid for 7 days, until 8 Dec 2026, 12:00 UTC, once');
  });

  it('a role outside the three is refused by field', async () => {
    const res = await callRoute(roleRoute, {
      method: 'PATCH',
      params: { workspace: world.shop.slug, userId: String(world.users.viewer.id) },
      body: { role: 'admin' },
    });
    expect(res.status).toBe(400);
    expect(res.json.issues).toEqual([{ path: 'role', message: 'Role must be one of: viewer, technician, owner' }]);
  });

  it('members of one workspace cannot reach another workspace’s members through their own', async () => {
    actAs(world.users.outsider.id);
    const res = await callRoute(removeRoute, {
      method: 'DELETE',
      params: { workspace: world.otherShop.slug, userId: String(world.users.viewer.id) },
    });
    expect(res.status).toBe(404);
    expect(await roleOf(world.users.viewer.id)).toBe('viewer');
  });
});

describe('printer profiles per workspace', () => {
  it('are saved by technicians and listed to viewers with the browser profile shape', async () => {
    actAs(world.users.technician.id);
    const saved = await callRoute(addProfileRoute, {
      params: { workspace: world.shop.slug },
      body: { name: 'Bench laser', printerScaleX: 0.987, printerScaleY: 1.004 },
    });
    expect(saved.status).toBe(201);
    actAs(world.users.viewer.id);
    const list = await callRoute(listProfilesRoute, { method: 'GET', params: { workspace: world.shop.slug } });
    expect(list.json).toEqual([
      { id: String(saved.json.id), name: 'Bench laser', printerScaleX: 0.987, printerScaleY: 1.004, createdAt: expect.any(String) },
    ]);
    expect(Number.isNaN(Date.parse(String(saved.json.createdAt)))).toBe(false);
  });

  it('refuse a scale outside 0.9–1.1 by field, as the browser form does', async () => {
    const res = await callRoute(addProfileRoute, {
      params: { workspace: world.shop.slug },
      body: { name: 'Bad', printerScaleX: 1.5, printerScaleY: 1 },
    });
    expect(res.status).toBe(400);
    expect(res.json.issues).toEqual([{ path: 'printerScaleX', message: 'Printer scale X must be at most 1.1 (allowed 0.9–1.1)' }]);
  });

  it('of another workspace are 404 through one’s own workspace, and stay where they are', async () => {
    const [row] = await world.knex(TABLES.printerProfiles)
      .insert({ workspace_id: world.shop.id, name: 'Shop inkjet', scale_x: 1, scale_y: 1, profile_json: '{}' })
      .returning('id');
    actAs(world.users.outsider.id);
    const res = await callRoute(deleteProfileRoute, {
      method: 'DELETE',
      params: { workspace: world.otherShop.slug, profileId: String(row.id) },
    });
    expect(res.status).toBe(404);
    const list = await callRoute(listProfilesRoute, { method: 'GET', params: { workspace: world.otherShop.slug } });
    expect(list.json).toEqual([]);
    expect(await world.knex(TABLES.printerProfiles).where({ id: row.id }).first()).toBeTruthy();
  });
});

describe('inviting', () => {
  it('needs the owner’s own address confirmed first', async () => {
    await world.knex(TABLES.users).where({ id: world.users.owner.id }).update({ email_verified_at: null });
    const res = await callRoute(inviteRoute, { params: { workspace: world.shop.slug }, body: { email: 'early@world.test', role: 'viewer' } });
    expect(res.status).toBe(403);
    expect(res.json.error).toMatch(/^Confirm your own e-mail address before inviting others/);
    expect(await world.knex(TABLES.invitations)).toEqual([]);
  });

  it('is refused in a personal workspace and for someone already a member', async () => {
    const [personal] = await world.knex(TABLES.workspaces).insert({ slug: 'owner-own', name: 'Own', kind: 'personal' }).returning('id');
    await world.knex(TABLES.memberships).insert({ user_id: world.users.owner.id, workspace_id: personal.id, role: 'owner' });
    const inPersonal = await callRoute(inviteRoute, { params: { workspace: 'owner-own' }, body: { email: 'x@world.test', role: 'viewer' } });
    expect([inPersonal.status, inPersonal.json.error]).toEqual([409, expect.stringContaining('create a shop workspace')]);
    const member = await callRoute(inviteRoute, { params: { workspace: world.shop.slug }, body: { email: 'VIEWER@world.test', role: 'owner' } });
    expect([member.status, member.json.error]).toEqual([409, 'VIEWER@world.test is already a member of World Shop']);
  });
});

describe('when the mail server is down', () => {
  it('an invitation is answered 502 with a clear message and its link never works', async () => {
    process.env.SMTP_URL = 'smtp://127.0.0.1:9'; // discard port: nothing listens there
    vi.spyOn(console, 'error').mockImplementation(() => undefined);
    try {
      const res = await callRoute(inviteRoute, { params: { workspace: world.shop.slug }, body: { email: 'lost@world.test', role: 'viewer' } });
      expect(res.status).toBe(502);
      expect(res.json.error).toMatch(/could not be sent/);
      const rows = await world.knex(TABLES.invitations).where({ email: 'lost@world.test' });
      expect(rows).toHaveLength(1);
      expect(rows[0].revoked_at).toBeTruthy();
    } finally {
      process.env.SMTP_URL = `smtp://127.0.0.1:${mail.smtpPort}`;
      vi.restoreAllMocks();
    }
  });
});
