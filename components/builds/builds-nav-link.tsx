'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

/** "Builds" in the header for members: the records of the workspace in the URL, else of their first shop. */
export function BuildsNavLink({ workspaces }: { workspaces: Array<{ slug: string; kind: 'personal' | 'shop' }> }) {
  const pathname = usePathname();
  const current = /^\/w\/([^/]+)/.exec(pathname ?? '')?.[1];
  const slug = workspaces.find((w) => w.slug === current)?.slug ?? workspaces.find((w) => w.kind === 'shop')?.slug ?? workspaces[0]?.slug;
  if (!slug) return null;
  return (
    <Link href={`/w/${slug}/builds`} className="rounded px-2 py-1 text-sm hover:bg-steel-100 dark:hover:bg-steel-800">
      Builds
    </Link>
  );
}
