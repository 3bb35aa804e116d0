'use client';

import { usePathname } from 'next/navigation';
import { useState } from 'react';

/**
 * On a phone the navigation and the account controls fold behind one "Menu" button, so the header is one short
 * row that never runs past the screen's edge; from the md breakpoint up they sit in the row itself.
 */
export function HeaderMenu({ children }: { children: React.ReactNode }) {
  const pathname = usePathname();
  // Open on the page where it was opened: following a link closes it.
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn !== null && openOn === pathname;
  return (
    <>
      <button
        type="button"
        aria-expanded={open}
        aria-controls="site-menu"
        onClick={() => setOpenOn(open ? null : pathname)}
        className="ml-auto inline-flex min-h-11 min-w-11 items-center justify-center gap-2 rounded-md border border-steel-300 px-3 text-sm font-medium md:hidden dark:border-steel-600"
      >
        <span aria-hidden className="text-lg leading-none">{open ? '×' : '≡'}</span>
        Menu
      </button>
      <div
        id="site-menu"
        className={`${open ? 'flex' : 'hidden'} w-full flex-col gap-2 border-t border-steel-200 pt-2 md:flex md:w-auto md:flex-1 md:flex-row md:items-center md:gap-6 md:border-0 md:pt-0 dark:border-steel-800`}
      >
        {children}
      </div>
    </>
  );
}
