'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

/** A navigation link that marks itself as the current page (aria-current) and looks it. */
export function NavLink({ href, exact = true, className = '', children }: { href: string; exact?: boolean; className?: string; children: React.ReactNode }) {
  const pathname = usePathname() ?? '';
  const current = exact ? pathname === href : pathname === href || pathname.startsWith(`${href}/`);
  return (
    <Link
      href={href}
      aria-current={current ? 'page' : undefined}
      className={`inline-flex min-h-11 items-center rounded px-2 hover:bg-steel-100 aria-[current=page]:font-semibold aria-[current=page]:underline aria-[current=page]:underline-offset-4 dark:hover:bg-steel-800 ${className}`}
    >
      {children}
    </Link>
  );
}
