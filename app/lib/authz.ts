import 'server-only';
import { findRole, findUserById, findWorkspaceBySlug, type WorkspaceKind } from '@/db/accounts';
import { can, weakestRoleFor, type Action } from '@/lib/access-policy';
import type { Role } from '@/lib/roles';
import { jsonError } from './api';
import { sessionUserId } from './session';

/** Why a request may not go on: 401 signed out, 404 not a member (never says more), 403 role too low. */
export class AccessError extends Error {
  constructor(
    public status: 401 | 403 | 404,
    message: string,
  ) {
    super(message);
    this.name = 'AccessError';
  }
}

export type Access = {
  user: { id: number; email: string; name: string };
  workspace: { id: number; slug: string; name: string; kind: WorkspaceKind };
  role: Role;
};

export const SIGNED_OUT_MESSAGE = 'Sign in to continue';
export const NOT_FOUND_MESSAGE = 'No such workspace or item';

/** The signed-in user as stored now (a deleted account reads as signed out), or null. */
export async function currentUser(): Promise<Access['user'] | null> {
  const id = await sessionUserId();
  if (id === null) return null;
  const row = await findUserById(id);
  return row ? { id: row.id, email: row.email, name: row.name } : null;
}

export async function requireUser(): Promise<Access['user']> {
  const user = await currentUser();
  if (!user) throw new AccessError(401, SIGNED_OUT_MESSAGE);
  return user;
}

/**
 * The caller's access to a workspace, if the policy lets their role do `action` there
 * (lib/access-policy.ts). A workspace the caller does not belong to answers exactly like one
 * that does not exist.
 */
export async function requireAction(workspaceSlug: string, action: Action): Promise<Access> {
  const user = await requireUser();
  const workspace = await findWorkspaceBySlug(workspaceSlug);
  const role = workspace ? await findRole(user.id, workspace.id) : undefined;
  if (!workspace || !role) throw new AccessError(404, NOT_FOUND_MESSAGE);
  if (!can(role, action)) {
    throw new AccessError(403, `This needs the ${weakestRoleFor(action)} role or higher in ${workspace.name}; you are ${role}`);
  }
  return { user, workspace, role };
}

/** Turns an AccessError into the API's error response (see `guarded` in route-handler.ts); anything else is not ours to answer. */
export function accessErrorResponse(err: unknown): Response | null {
  return err instanceof AccessError ? jsonError(err.status, err.message) : null;
}
