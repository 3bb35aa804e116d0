/** The live answer of a calculator: announced politely as it changes. */
export function ResultPanel({ title, children, id }: { title: string; children: React.ReactNode; id: string }) {
  return (
    <section
      aria-labelledby={`${id}-title`}
      className="rounded-lg border border-gauge-600/40 bg-white p-4 shadow-sm dark:border-gauge-500/40 dark:bg-steel-900"
    >
      <h2 id={`${id}-title`} className="text-xs font-bold uppercase tracking-[0.14em] text-gauge-700 dark:text-gauge-500">
        {title}
      </h2>
      <div id={id} role="status" aria-live="polite" aria-atomic="true" className="mt-2 space-y-2">
        {children}
      </div>
    </section>
  );
}

/** A figure in the result: label, big mono value, optional small print. */
export function ResultFigure({ label, value, detail, testId }: { label: string; value: string; detail?: React.ReactNode; testId?: string }) {
  return (
    <div>
      <p className="text-xs text-steel-500 dark:text-steel-400">{label}</p>
      <p className="font-mono text-2xl font-semibold tabular-nums text-steel-900 dark:text-steel-50" data-testid={testId}>
        {value}
      </p>
      {detail ? <p className="text-xs text-steel-600 dark:text-steel-300">{detail}</p> : null}
    </div>
  );
}

export function WaitingForInput() {
  return <p className="text-sm text-steel-500">Fix the fields marked above to see the answer.</p>;
}
