import Link from 'next/link';
import { HeaderMenu } from './header-menu';
import { Logo } from './logo';
import { NavLink } from './nav-link';

const NAV = [
  { href: '/', label: 'Sheet maker', exact: true },
  { href: '/printer-check', label: 'Printer check', exact: true },
  { href: '/calculators', label: 'Calculators', exact: false },
];

export function SiteHeader({ children }: { children?: React.ReactNode }) {
  return (
    <header className="border-b border-steel-200 bg-white/80 dark:border-steel-800 dark:bg-steel-900/80">
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2">
        <Link href="/" className="flex min-h-11 items-center gap-2 text-lg font-bold tracking-tight">
          <Logo />
          <span>Rimscale</span>
        </Link>
        <HeaderMenu>
          <nav aria-label="Main" className="flex flex-col gap-1 text-sm md:flex-1 md:flex-row md:gap-4">
            {NAV.map((item) => (
              <NavLink key={item.href} href={item.href} exact={item.exact}>
                {item.label}
              </NavLink>
            ))}
          </nav>
          {children}
        </HeaderMenu>
      </div>
    </header>
  );
}
