import Link from 'next/link';
import { SignOutButton } from './sign-out-button';
import { WorkspaceSwitcher } from './workspace-switcher';
import { WorkspaceSectionLink } from '@/components/workspace/workspace-section-link';

/** The header's right side: sign-in link for visitors; workspace switcher, account and sign-out for members. */
type Props = {
  /** Null for a visitor; the page's layout loads it (app/lib/signed-in-member.ts). */
  member: { user: { name: string }; workspaces: { slug: string; name: string; kind: 'personal' | 'shop' }[] } | null;
};

export function AccountMenu({ member }: Props) {
  if (!member) {
    return (
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <Link href="/sign-in" className="inline-flex min-h-11 items-center rounded px-2 hover:bg-steel-100 dark:hover:bg-steel-800">
          Sign in
        </Link>
        <Link href="/sign-up" className="inline-flex min-h-11 items-center rounded bg-gauge-600 px-3 font-semibold text-white hover:bg-gauge-700">
          Create account
        </Link>
      </div>
    );
  }
  const { user, workspaces } = member;
  return (
    <div className="flex flex-wrap items-center gap-2">
      <WorkspaceSectionLink workspaces={workspaces.map(({ slug, kind }) => ({ slug, kind }))} section="templates">
        Templates
      </WorkspaceSectionLink>
      <WorkspaceSectionLink workspaces={workspaces.map(({ slug, kind }) => ({ slug, kind }))} section="builds">
        Builds
      </WorkspaceSectionLink>
      <WorkspaceSwitcher workspaces={workspaces.map(({ slug, name, kind }) => ({ slug, name, kind }))} />
      <Link href="/account" className="inline-flex min-h-11 items-center rounded px-2 text-sm hover:bg-steel-100 dark:hover:bg-steel-800" aria-label={`Account of ${user.name}`}>
        {user.name}
      </Link>
      <SignOutButton />
    </div>
  );
}
