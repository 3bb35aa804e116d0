import { CAUTION_LINES, MANUAL_FIRST, PRINT_AT_100 } from '@/lib/sheet/sheet-notes';

export function SafetyPanel() {
  return (
    <aside aria-labelledby="safety-heading" className="rounded-lg border border-steel-300 bg-steel-100/70 p-4 text-sm dark:border-steel-700 dark:bg-steel-900">
      <h2 id="safety-heading" className="flex items-center gap-2 text-xs font-bold uppercase tracking-[0.14em] text-steel-700 dark:text-steel-200">
        <span aria-hidden className="inline-block h-2.5 w-2.5 rotate-45 bg-spark-500" />
        Before you turn the engine
      </h2>
      <ul className="mt-2 space-y-1 text-steel-700 dark:text-steel-300">
        {CAUTION_LINES.map((caution) => (
          <li key={caution} className="flex gap-2">
            <span aria-hidden className="text-steel-400">—</span>
            <span>{caution}</span>
          </li>
        ))}
      </ul>
      <p className="mt-3 text-xs text-steel-500 dark:text-steel-400">{MANUAL_FIRST}</p>
    </aside>
  );
}

export function PrintAtActualSize() {
  return (
    <p className="rounded-md border-l-4 border-gauge-600 bg-white px-3 py-2 text-sm font-medium text-steel-800 dark:bg-steel-900 dark:text-steel-100">
      {PRINT_AT_100}.
    </p>
  );
}
