'use client';

import { usePathname, useRouter } from 'next/navigation';
import { useState } from 'react';

type Option = { slug: string; name: string; kind: 'personal' | 'shop' };

/**
 * Jumps to another workspace's home; shows the one in the URL as chosen. Choosing only picks (an arrow key on the
 * menu must not leave the page); "Open" goes there.
 */
export function WorkspaceSwitcher({ workspaces }: { workspaces: Option[] }) {
  const pathname = usePathname();
  const router = useRouter();
  const current = /^\/w\/([^/]+)/.exec(pathname ?? '')?.[1] ?? '';
  const inUrl = workspaces.some((w) => w.slug === current) ? current : '';
  const [picked, setPicked] = useState<{ on: string; slug: string } | null>(null);
  const chosen = picked && picked.on === pathname ? picked.slug : inUrl;
  return (
    <form
      className="flex items-center gap-1 text-sm"
      onSubmit={(event) => {
        event.preventDefault();
        if (chosen && chosen !== current) router.push(`/w/${chosen}`);
      }}
    >
      <select
        aria-label="Workspace"
        value={chosen}
        onChange={(e) => setPicked({ on: pathname ?? '', slug: e.target.value })}
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
      {chosen && chosen !== current ? (
        <button type="submit" className="min-h-11 rounded-md bg-gauge-600 px-3 font-semibold text-white hover:bg-gauge-700">
          Open
        </button>
      ) : null}
    </form>
  );
}
