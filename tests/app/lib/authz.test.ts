import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { AccessError, accessErrorResponse, currentUser, requireAction, requireUser } from '@/app/lib/authz';
import { actAs } from '@/tests/support/session';
import { createAccessWorld, type AccessWorld } from '@/tests/support/access-world';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

let world: AccessWorld;
beforeEach(async () => {
  world = await createAccessWorld();
});
afterEach(async () => {
  actAs(null);
  await world.cleanup();
});

async function statusOf(promise: Promise<unknown>): Promise<number | 'ok'> {
  try {
    await promise;
    return 'ok';
  } catch (err) {
    if (err instanceof AccessError) return err.status;
    throw err;
  }
}

describe('currentUser and requireUser', () => {
  it('read the acting user from the database, and nobody when signed out', async () => {
    actAs(world.users.viewer.id);
    expect(await currentUser()).toEqual({ id: world.users.viewer.id, email: 'viewer@world.test', name: 'World viewer' });
    actAs(null);
    expect(await currentUser()).toBeNull();
    expect(await statusOf(requireUser())).toBe(401);
  });

  it('treat a session whose user was deleted as signed out', async () => {
    actAs(world.users.viewer.id);
    await world.knex('users').where({ id: world.users.viewer.id }).del();
    expect(await statusOf(requireUser())).toBe(401);
  });
});

describe('requireAction', () => {
  it('lets a role through where the policy grants the action and answers 403 where it does not', async () => {
    // Expected statuses written out from the role table in DEVELOPERS.md, not read back from the policy.
    const cases = [
      ['viewer', 'template.read', 'ok'],
      ['viewer', 'template.edit', 403],
      ['technician', 'template.edit', 'ok'],
      ['technician', 'template.delete', 403],
      ['technician', 'members.manage', 403],
      ['owner', 'members.manage', 'ok'],
    ] as const;
    for (const [who, action, expected] of cases) {
      actAs(world.users[who].id);
      expect(await statusOf(requireAction(world.shop.slug, action)), `${who} doing ${action}`).toBe(expected);
    }
  });

  it('names the weakest role that may do the action in its 403 message', async () => {
    actAs(world.users.viewer.id);
    const err = await requireAction(world.shop.slug, 'template.delete').catch((e: AccessError) => e);
    expect((err as AccessError).message).toBe('This needs the owner role or higher in World Shop; you are viewer');
  });

  it('answers 404 alike for a workspace the caller is not in and one that does not exist', async () => {
    actAs(world.users.outsider.id);
    const foreign = await requireAction(world.shop.slug, 'workspace.read').catch((e: AccessError) => e);
    const missing = await requireAction('no-such-shop', 'workspace.read').catch((e: AccessError) => e);
    expect(foreign).toBeInstanceOf(AccessError);
    expect(missing).toBeInstanceOf(AccessError);
    expect([(foreign as AccessError).status, (foreign as AccessError).message]).toEqual([
      (missing as AccessError).status,
      (missing as AccessError).message,
    ]);
    expect((foreign as AccessError).status).toBe(404);
  });

  it('answers 401 before looking at the workspace when signed out', async () => {
    actAs(null);
    expect(await statusOf(requireAction('no-such-shop', 'workspace.read'))).toBe(401);
  });

  it('returns the user, workspace and role on success', async () => {
    actAs(world.users.technician.id);
    const access = await requireAction(world.shop.slug, 'workspace.read');
    expect(access.role).toBe('technician');
    expect(access.workspace).toEqual({ id: world.shop.id, slug: 'world-shop', name: 'World Shop', kind: 'shop' });
  });
});

describe('accessErrorResponse', () => {
  it('maps an AccessError to the API error shape and ignores other errors', async () => {
    const response = accessErrorResponse(new AccessError(403, 'Too low'));
    expect(response?.status).toBe(403);
    expect(await response?.json()).toEqual({ error: 'Too low', issues: [] });
    expect(accessErrorResponse(new Error('other'))).toBeNull();
  });
});
