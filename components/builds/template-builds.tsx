import Link from 'next/link';
import type { BuildPage } from '@/lib/builds/build';
import { StatusBadge } from './status-badge';
import { formatDate, type DateFormat } from '@/lib/format/date-format';

/** The template page's list of the engines built from it, newest change first, with a link to start another. */
export function TemplateBuilds({ slug, templateId, page, canCreate, dateFormat }: { slug: string; templateId: number; page: BuildPage; canCreate: boolean; dateFormat: DateFormat }) {
  return (
    <section aria-labelledby="builds-heading" className="space-y-2">
      <h2 id="builds-heading" className="text-lg font-semibold">
        Builds from this template
      </h2>
      {page.total === 0 ? <p className="text-sm text-steel-600">No engine has been built from this template yet.</p> : null}
      <ul className="space-y-1 text-sm">
        {page.items.map((b) => (
          <li key={b.id} className="flex flex-wrap items-center gap-2">
            <Link href={`/w/${slug}/builds/${b.id}`} className="text-gauge-700 underline dark:text-gauge-300">
              {b.customerName}
            </Link>
            <span className="text-steel-600">{[b.engineNumber, formatDate(b.openedOn, dateFormat), `template version ${b.templateVersion ?? '—'}`].filter(Boolean).join(' · ')}</span>
            <StatusBadge status={b.status} />
          </li>
        ))}
      </ul>
      {page.total > page.items.length ? (
        <Link href={`/w/${slug}/builds?template=${templateId}`} className="text-sm underline">
          All {page.total} builds from this template
        </Link>
      ) : null}
      {canCreate ? (
        <p>
          <Link href={`/w/${slug}/builds/new?template=${templateId}`} className="rounded-md bg-gauge-600 px-3 py-1.5 text-sm font-semibold text-white">
            New build record from this template
          </Link>
        </p>
      ) : null}
    </section>
  );
}
