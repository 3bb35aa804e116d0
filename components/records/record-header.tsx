import Link from 'next/link';

/**
 * The head of a record page (a template, a build record): a link back to the list, the record's
 * name as the page heading, the lines about it, and the actions the page's role allows (the page
 * asks the policy and hands over only what may be shown).
 */
export function RecordHeader({ back, title, children, actions }: { back: { href: string; label: string }; title: React.ReactNode; children: React.ReactNode; actions: React.ReactNode }) {
  return (
    <header className="flex flex-wrap items-start justify-between gap-4">
      <div>
        <p className="text-sm">
          <Link href={back.href} className="text-gauge-700 underline dark:text-gauge-300">
            {back.label}
          </Link>
        </p>
        <h1 className="text-2xl font-bold">{title}</h1>
        {children}
      </div>
      <div className="flex flex-wrap items-start gap-2">{actions}</div>
    </header>
  );
}

/** The record's Edit button, a link to its edit page. */
export function EditLink({ href }: { href: string }) {
  return (
    <Link href={href} className="inline-flex min-h-11 items-center rounded-md bg-gauge-600 px-3 text-sm font-semibold text-white">
      Edit
    </Link>
  );
}
