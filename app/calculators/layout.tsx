import { NavLink } from '@/components/shell/nav-link';
import { CALCULATORS } from './calculator-list';

// Public section (DEVELOPERS.md, "Public pages"): no sign-in, nothing stored; every answer is computed in the browser.
export default function CalculatorsLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="space-y-6">
      <nav aria-label="Calculators" className="flex flex-wrap gap-2 border-b border-steel-200 pb-3 text-sm dark:border-steel-800">
        <NavLink href="/calculators">All calculators</NavLink>
        {CALCULATORS.map((calculator) => (
          <NavLink key={calculator.href} href={calculator.href}>
            {calculator.title}
          </NavLink>
        ))}
      </nav>
      {children}
    </div>
  );
}
