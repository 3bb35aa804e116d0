import { describe, expect, it, vi } from 'vitest';
import { POST as signOutEverywhere } from '@/app/api/v1/account/sign-out-everywhere/route';
import { authOptions } from '@/app/lib/auth-options';
import { TABLES } from '@/db/tables';
import { callRoute } from '@/tests/support/call-route';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { actAs } from '@/tests/support/session';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest();

const versionOf = async (id: number) => (await world.knex(TABLES.users).where({ id }).first()).session_version as number;

describe('signing out (issue 11, hole 6)', () => {
  it('raises the session version, so the signed-out cookie (version 0) no longer matches; a replayed sign-out changes nothing more', async () => {
    const { id } = world.users.technician;
    const token = { sub: String(id), sv: 0 };
    await authOptions.events!.signOut!({ token, session: undefined as never });
    expect(await versionOf(id)).toBe(1);
    await authOptions.events!.signOut!({ token, session: undefined as never });
    expect(await versionOf(id)).toBe(1);
    expect(await world.knex(TABLES.auditLog).where({ action: 'signed-out', actor_user_id: id }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('everywhere, as an account action: every session of the account ends', async () => {
    const { id } = world.users.viewer;
    actAs(id);
    const response = await callRoute(signOutEverywhere);
    expect(response).toEqual({ status: 200, json: { signedOut: true } });
    expect(await versionOf(id)).toBe(1);
    actAs(null);
    expect((await callRoute(signOutEverywhere)).status).toBe(401);
  });
});
