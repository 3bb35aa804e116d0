import type { Metadata } from 'next';
import Link from 'next/link';
import { requestDateFormat } from '@/app/lib/date-format';
import { pageAction } from '@/app/lib/page-access';
import { can } from '@/lib/access-policy';
import { TemplateList } from '@/components/templates/template-list';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Engine templates' };

type Props = { params: Promise<{ workspace: string }> };

export default async function TemplatesPage({ params }: Props) {
  const { workspace: slug } = await params;
  const access = await pageAction(slug, 'template.read', `/w/${slug}/templates`);
  if ('denied' in access) return <p role="alert">{access.denied}</p>;
  const canEdit = can(access.role, 'template.edit');
  const canImport = can(access.role, 'template.import');
  return (
    <section className="space-y-4">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold">Engine templates</h1>
          <p className="text-sm text-steel-600 dark:text-steel-300">
            <Link href={`/w/${slug}`} className="underline">
              {access.workspace.name}
            </Link>{' '}
            · measured once, printed by anyone in the workspace
          </p>
        </div>
        <div className="flex gap-3 text-sm">
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
        </div>
      </div>
      <TemplateList slug={slug} dateFormat={await requestDateFormat()} />
    </section>
  );
}
