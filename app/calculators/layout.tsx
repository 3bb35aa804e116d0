import { requestDateFormat } from '@/app/lib/date-format';
import { ReaderLocale } from '@/components/format/reader-locale';
import { NavLink } from '@/components/shell/nav-link';
import { CALCULATORS } from './calculator-list';

// Public section (DEVELOPERS.md, "Public pages"): no sign-in, nothing stored; every answer is computed in the browser,
// its figures written in the reader's locale.
export default async function CalculatorsLayout({ children }: { children: React.ReactNode }) {
  const { locale } = await requestDateFormat();
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
      <ReaderLocale locale={locale}>{children}</ReaderLocale>
    </div>
  );
}
