import { can, type Action } from '@/lib/access-policy';
import { ROLES, type Role } from '@/lib/roles';

/** Callers the authorization matrix runs every row as: each role, plus nobody and a member of another shop. */
export const ACTORS = ['signedOut', ...ROLES, 'outsider'] as const;
export type Actor = (typeof ACTORS)[number];

/**
 * What a workspace route guarded by `action` answers each caller, read from the policy table
 * (lib/access-policy.ts): 401 signed out, 404 for an outsider, `success` for a role the policy
 * grants the action, 403 for one it does not. `overrides` states the rare answer that differs
 * past the role check (a last owner refused with 409, a JSON body refused with 415).
 */
export function guardedBy(
  action: Action,
  success: number,
  overrides: Partial<Record<Role, number>> = {},
): { action: Action; expected: Record<Actor, number> } {
  const byRole = Object.fromEntries(ROLES.map((role) => [role, can(role, action) ? (overrides[role] ?? success) : 403]));
  return { action, expected: { signedOut: 401, outsider: 404, ...byRole } as Record<Actor, number> };
}
