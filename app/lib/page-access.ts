import 'server-only';
import { headers } from 'next/headers';
import { forbidden, notFound, redirect } from 'next/navigation';
import { AccessError, requireAction, requireUser, type Access } from './authz';
import { workspacePageOf } from './page-actions';
import { PAGE_PATH_HEADER } from './page-path-header';

function pageOrThrow(pathname: string) {
  const page = workspacePageOf(pathname);
  if (!page) throw new Error(`No access rule for the page ${pathname}: add it to app/lib/page-actions.ts`);
  return page;
}

/**
 * The access a workspace page needs (app/lib/page-actions.ts, by its path): signed out → sign-in
 * (and back), not a member → the 404 page, not allowed → the 403 page (app/forbidden.tsx,
 * answered with status 403) saying why and what the role can do instead.
 */
export async function pageAction(pathname: string): Promise<Access> {
  const { workspaceSlug, action } = pageOrThrow(pathname);
  try {
    return await requireAction(workspaceSlug, action);
  } catch (err) {
    if (!(err instanceof AccessError)) throw err;
    if (err.status === 401) redirect(`/sign-in?callbackUrl=${encodeURIComponent(pathname)}`);
    if (err.status === 404) notFound();
    forbidden();
  }
}

/**
 * Why this request's page is refused, worked out again from its path: the 403 page renders beside
 * the page, so it cannot wait for the page to tell it. Empty when the path is no workspace page.
 */
export async function pageRefusal(): Promise<{ message: string; workspaceSlug: string }> {
  const page = workspacePageOf((await headers()).get(PAGE_PATH_HEADER) ?? '');
  if (!page) return { message: '', workspaceSlug: '' };
  try {
    await requireAction(page.workspaceSlug, page.action);
    return { message: '', workspaceSlug: page.workspaceSlug };
  } catch (err) {
    if (err instanceof AccessError && err.status === 403) return { message: err.message, workspaceSlug: page.workspaceSlug };
    return { message: '', workspaceSlug: '' };
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
