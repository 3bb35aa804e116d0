'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

type Workspace = { slug: string; kind: 'personal' | 'shop' };

/** The workspace a header link leads into: the one in the URL, else the member's first shop, else their first workspace. */
export function workspaceForLink(pathname: string, workspaces: Workspace[]): string | undefined {
  const current = /^\/w\/([^/]+)/.exec(pathname)?.[1];
  return workspaces.find((w) => w.slug === current)?.slug ?? workspaces.find((w) => w.kind === 'shop')?.slug ?? workspaces[0]?.slug;
}

/** A header link to one section of a workspace ("Templates", "Builds") for members; nothing without a workspace. */
export function WorkspaceSectionLink({ workspaces, section, children }: { workspaces: Workspace[]; section: 'templates' | 'builds'; children: React.ReactNode }) {
  const slug = workspaceForLink(usePathname() ?? '', workspaces);
  if (!slug) return null;
  return (
    <Link href={`/w/${slug}/${section}`} className="inline-flex min-h-11 items-center rounded px-2 text-sm hover:bg-steel-100 dark:hover:bg-steel-800">
      {children}
    </Link>
  );
}
