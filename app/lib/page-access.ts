import 'server-only';
import { forbidden, notFound, redirect } from 'next/navigation';
import type { Action } from '@/lib/access-policy';
import { AccessError, requireAction, requireUser, type Access } from './authz';
import { forbiddenReason } from './forbidden-reason';

/**
 * requireAction for pages: signed out → sign-in (and back), not a member → the 404 page, not allowed → the 403
 * page (app/forbidden.tsx, answered with status 403) saying why and what the role can do instead.
 */
export async function pageAction(workspaceSlug: string, action: Action, backTo: string): Promise<Access> {
  try {
    return await requireAction(workspaceSlug, action);
  } catch (err) {
    if (!(err instanceof AccessError)) throw err;
    if (err.status === 401) redirect(`/sign-in?callbackUrl=${encodeURIComponent(backTo)}`);
    if (err.status === 404) notFound();
    Object.assign(forbiddenReason(), { message: err.message, workspaceSlug });
    forbidden();
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
