'use client';

import { usePathname, useRouter } from 'next/navigation';

type Option = { slug: string; name: string; kind: 'personal' | 'shop' };

/** Jumps to another workspace's home; shows the one in the URL as chosen. */
export function WorkspaceSwitcher({ workspaces }: { workspaces: Option[] }) {
  const pathname = usePathname();
  const router = useRouter();
  const current = /^\/w\/([^/]+)/.exec(pathname ?? '')?.[1] ?? '';
  return (
    <label className="flex items-center gap-2 text-sm">
      <span className="sr-only">Workspace</span>
      <select
        aria-label="Workspace"
        value={workspaces.some((w) => w.slug === current) ? current : ''}
        onChange={(e) => {
          if (e.target.value) router.push(`/w/${e.target.value}`);
        }}
        className="min-h-11 max-w-[14rem] rounded-md border border-steel-300 bg-white px-2 text-sm dark:border-steel-600 dark:bg-steel-900"
      >
        <option value="">Choose a workspace…</option>
        {workspaces.map((w) => (
          <option key={w.slug} value={w.slug}>
            {w.name}
            {w.kind === 'personal' ? ' (personal)' : ''}
          </option>
        ))}
      </select>
    </label>
  );
}
