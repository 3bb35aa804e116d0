import 'server-only';
import { cache } from 'react';
import { workspacesOf } from '@/db/accounts';
import { currentUser, type Access } from './authz';

export type SignedInMember = {
  user: Access['user'];
  workspaces: Awaited<ReturnType<typeof workspacesOf>>;
};

/**
 * The signed-in user with every workspace they belong to (and their role there), or null for a
 * visitor. Cached per request: the layout's menu and a page may both ask.
 */
export const signedInMember = cache(async (): Promise<SignedInMember | null> => {
  const user = await currentUser();
  if (!user) return null;
  return { user, workspaces: await workspacesOf(user.id) };
});
