import type { Metadata } from 'next';
import Link from 'next/link';
import { ListPageHeader } from '@/components/lists/list-page-header';
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
  const access = await pageAction(`/w/${slug}/builds`);
  const { templates, technicians } = await buildPageData(access.workspace.id);
  return (
    <section className="space-y-4">
      <ListPageHeader title="Build records" workspace={{ slug, name: access.workspace.name }} tagline="one record per engine set up for a customer">
        {can(access.role, 'build.edit') ? (
          <Link href={`/w/${slug}/builds/new`} className="rounded-md bg-gauge-600 px-3 py-1.5 font-semibold text-white">
            New record
          </Link>
        ) : null}
        <a href={`/api/v1/workspaces/${slug}/builds/export`} className="rounded-md border border-steel-300 px-3 py-1.5">
          Export CSV
        </a>
      </ListPageHeader>
      <BuildList slug={slug} technicians={technicians} templates={templates.map((t) => ({ id: t.id, name: t.name }))} dateFormat={await requestDateFormat()} />
    </section>
  );
}
