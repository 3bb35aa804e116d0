import 'server-only';
import { notFound, redirect } from 'next/navigation';
import type { Role } from '@/lib/roles';
import { AccessError, requireRole, requireUser, type Access } from './authz';

/** requireRole for pages: signed out → sign-in (and back), not a member → the 404 page, too low → 403 message. */
export async function pageRole(workspaceSlug: string, minimum: Role, backTo: string): Promise<Access | { denied: string }> {
  try {
    return await requireRole(workspaceSlug, minimum);
  } catch (err) {
    if (!(err instanceof AccessError)) throw err;
    if (err.status === 401) redirect(`/sign-in?callbackUrl=${encodeURIComponent(backTo)}`);
    if (err.status === 404) notFound();
    return { denied: err.message };
  }
}

export async function pageUser(backTo: string): Promise<Access['user']> {
  try {
    return await requireUser();
  } catch (err) {
    if (err instanceof AccessError) redirect(`/sign-in?callbackUrl=${encodeURIComponent(backTo)}`);
    throw err;
  }
}
