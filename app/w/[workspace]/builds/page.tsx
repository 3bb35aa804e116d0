import type { Metadata } from 'next';
import Link from 'next/link';
import { buildPageData } from '@/app/lib/build-page-data';
import { pageAction } from '@/app/lib/page-access';
import { BuildList } from '@/components/builds/build-list';
import { can } from '@/lib/access-policy';
import { requestDateFormat } from '@/app/lib/date-format';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Build records' };

type Props = { params: Promise<{ workspace: string }> };

export default async function BuildsPage({ params }: Props) {
  const { workspace: slug } = await params;
  const access = await pageAction(slug, 'build.read', `/w/${slug}/builds`);
  if ('denied' in access) return <p role="alert">{access.denied}</p>;
  const { templates, technicians } = await buildPageData(access.workspace.id);
  return (
    <section className="space-y-4">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold">Build records</h1>
          <p className="text-sm text-steel-600 dark:text-steel-300">
            <Link href={`/w/${slug}`} className="underline">
              {access.workspace.name}
            </Link>{' '}
            · one record per engine set up for a customer
          </p>
        </div>
        <div className="flex gap-3 text-sm">
          {can(access.role, 'build.edit') ? (
            <Link href={`/w/${slug}/builds/new`} className="rounded-md bg-gauge-600 px-3 py-1.5 font-semibold text-white">
              New record
            </Link>
          ) : null}
          <a href={`/api/v1/workspaces/${slug}/builds/export`} className="rounded-md border border-steel-300 px-3 py-1.5">
            Export CSV
          </a>
        </div>
      </div>
      <BuildList slug={slug} technicians={technicians} templates={templates.map((t) => ({ id: t.id, name: t.name }))} dateFormat={await requestDateFormat()} />
    </section>
  );
}
