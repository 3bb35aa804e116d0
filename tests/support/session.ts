/**
 * Lets unit tests of route handlers and server actions act as any user, without cookies.
 * In the test file:
 *
 *   vi.mock('@/app/lib/session', () => import('@/tests/support/session'));
 *   import { actAs } from '@/tests/support/session';
 *   actAs(world.users.owner.id);   // or actAs(null) for a signed-out visitor
 *
 * The mock replaces the one module that reads the next-auth session, so every
 * authorization check (app/lib/authz.ts) sees the acting user.
 */
let actingUserId: number | null = null;

export function actAs(userId: number | null): void {
  actingUserId = userId;
}

/** Same signature as app/lib/session.ts. */
export async function sessionUserId(): Promise<number | null> {
  return actingUserId;
}
