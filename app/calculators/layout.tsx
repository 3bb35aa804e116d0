import Link from 'next/link';
import { CALCULATORS } from './calculator-list';

// Public section (DEVELOPERS.md, "Public pages"): no sign-in, nothing stored; every answer is computed in the browser.
export default function CalculatorsLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="space-y-6">
      <nav aria-label="Calculators" className="flex flex-wrap gap-2 border-b border-steel-200 pb-3 text-sm dark:border-steel-800">
        <Link href="/calculators" className="rounded px-2 py-1 font-semibold hover:bg-steel-100 dark:hover:bg-steel-800">
          All calculators
        </Link>
        {CALCULATORS.map((calculator) => (
          <Link key={calculator.href} href={calculator.href} className="rounded px-2 py-1 hover:bg-steel-100 dark:hover:bg-steel-800">
            {calculator.title}
          </Link>
        ))}
      </nav>
      {children}
    </div>
  );
}
