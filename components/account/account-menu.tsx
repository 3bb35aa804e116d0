import Link from 'next/link';
import { currentUser } from '@/app/lib/authz';
import { workspacesOf } from '@/db/accounts';
import { SignOutButton } from './sign-out-button';
import { WorkspaceSwitcher } from './workspace-switcher';
import { TemplatesNavLink } from '@/components/templates/templates-nav-link';

/** The header's right side: sign-in link for visitors; workspace switcher, account and sign-out for members. */
export async function AccountMenu() {
  const user = await currentUser();
  if (!user) {
    return (
      <div className="flex items-center gap-2 text-sm">
        <Link href="/sign-in" className="rounded px-2 py-1 hover:bg-steel-100 dark:hover:bg-steel-800">
          Sign in
        </Link>
        <Link href="/sign-up" className="rounded bg-gauge-600 px-2 py-1 font-semibold text-white hover:bg-gauge-700">
          Create account
        </Link>
      </div>
    );
  }
  const workspaces = await workspacesOf(user.id);
  return (
    <div className="flex items-center gap-2">
      <TemplatesNavLink workspaces={workspaces.map(({ slug, kind }) => ({ slug, kind }))} />
      <WorkspaceSwitcher workspaces={workspaces.map(({ slug, name, kind }) => ({ slug, name, kind }))} />
      <Link href="/account" className="rounded px-2 py-1 text-sm hover:bg-steel-100 dark:hover:bg-steel-800" aria-label={`Account of ${user.name}`}>
        {user.name}
      </Link>
      <SignOutButton />
    </div>
  );
}
