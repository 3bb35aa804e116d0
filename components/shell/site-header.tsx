import Link from 'next/link';
import { Logo } from './logo';

const NAV = [
  { href: '/', label: 'Sheet maker' },
  { href: '/printer-check', label: 'Printer check' },
  { href: '/calculators', label: 'Calculators' },
];

export function SiteHeader({ children }: { children?: React.ReactNode }) {
  return (
    <header className="border-b border-steel-200 bg-white/80 dark:border-steel-800 dark:bg-steel-900/80">
      <div className="mx-auto flex max-w-7xl items-center gap-6 px-4 py-3">
        <Link href="/" className="flex items-center gap-2 text-lg font-bold tracking-tight">
          <Logo />
          <span>Rimscale</span>
        </Link>
        <nav aria-label="Main" className="flex flex-1 gap-4 text-sm">
          {NAV.map((item) => (
            <Link key={item.href} href={item.href} className="rounded px-2 py-1 hover:bg-steel-100 dark:hover:bg-steel-800">
              {item.label}
            </Link>
          ))}
        </nav>
        {children}
      </div>
    </header>
  );
}
