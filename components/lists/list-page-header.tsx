import Link from 'next/link';

/** The heading of a workspace's list page: its title, the workspace it belongs to with a line on what it holds, and the page's actions. */
export function ListPageHeader({ title, workspace, tagline, children }: { title: string; workspace: { slug: string; name: string }; tagline: string; children: React.ReactNode }) {
  return (
    <div className="flex flex-wrap items-baseline justify-between gap-3">
      <div>
        <h1 className="text-2xl font-bold">{title}</h1>
        <p className="text-sm text-steel-600 dark:text-steel-300">
          <Link href={`/w/${workspace.slug}`} className="underline">
            {workspace.name}
          </Link>{' '}
          · {tagline}
        </p>
      </div>
      <div className="flex gap-3 text-sm">{children}</div>
    </div>
  );
}
