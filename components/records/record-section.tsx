/** A titled part of a record page (a template, a build record): a section named by its own heading, for screen readers and tests. */
export function RecordSection({ id, title, className = 'space-y-2', children }: { id: string; title: string; className?: string; children: React.ReactNode }) {
  return (
    <section aria-labelledby={`${id}-heading`} className={className}>
      <h2 id={`${id}-heading`} className="text-lg font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}
