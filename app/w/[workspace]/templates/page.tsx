import type { Metadata } from 'next';
import Link from 'next/link';
import { ListPageHeader } from '@/components/lists/list-page-header';
import { requestDateFormat } from '@/app/lib/date-format';
import { pageAction } from '@/app/lib/page-access';
import { can } from '@/lib/access-policy';
import { TemplateList } from '@/components/templates/template-list';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Engine templates' };

type Props = { params: Promise<{ workspace: string }> };

export default async function TemplatesPage({ params }: Props) {
  const { workspace: slug } = await params;
  const access = await pageAction(`/w/${slug}/templates`);
  const canEdit = can(access.role, 'template.edit');
  const canImport = can(access.role, 'template.import');
  return (
    <section className="space-y-4">
      <ListPageHeader title="Engine templates" workspace={{ slug, name: access.workspace.name }} tagline="measured once, printed by anyone in the workspace">
        {canEdit ? (
          <Link href={`/w/${slug}/templates/new`} className="rounded-md bg-gauge-600 px-3 py-1.5 font-semibold text-white">
            New template
          </Link>
        ) : null}
        {canImport ? (
          <Link href={`/w/${slug}/templates/import`} className="rounded-md border border-steel-300 px-3 py-1.5">
            Import CSV
          </Link>
        ) : null}
        <a href={`/api/v1/workspaces/${slug}/templates/export`} className="rounded-md border border-steel-300 px-3 py-1.5">
          Export CSV
        </a>
      </ListPageHeader>
      <TemplateList slug={slug} dateFormat={await requestDateFormat()} />
    </section>
  );
}
