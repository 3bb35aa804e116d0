import type { Metadata } from 'next';
import Link from 'next/link';
import { CALCULATORS } from './calculator-list';

export const metadata: Metadata = { title: 'Engine calculators' };

export default function CalculatorsPage() {
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Engine calculators</h1>
      <p className="max-w-2xl text-steel-600 dark:text-steel-300">
        The sums around a timing job, worked out as you type. No account needed; each answer can go straight onto a sheet.
      </p>
      <ul className="grid gap-4 sm:grid-cols-2">
        {CALCULATORS.map((calculator) => (
          <li key={calculator.href}>
            <Link
              href={calculator.href}
              className="block h-full rounded-lg border border-steel-200 bg-white p-4 hover:border-gauge-600 dark:border-steel-800 dark:bg-steel-900"
            >
              <h2 className="font-semibold text-gauge-700 dark:text-gauge-500">{calculator.title}</h2>
              <p className="mt-1 text-sm text-steel-600 dark:text-steel-300">{calculator.summary}</p>
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}
