import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { buildPageData } from '@/app/lib/build-page-data';
import { requestDateFormat } from '@/app/lib/date-format';
import { pageAction } from '@/app/lib/page-access';
import { BuildForm } from '@/components/builds/build-form';
import { findStoredBuild } from '@/db/builds/find-build';
import { parsePathId } from '@/lib/path-id';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Edit build record' };

type Props = { params: Promise<{ workspace: string; id: string }> };

export default async function EditBuildPage({ params }: Props) {
  const { workspace: slug, id } = await params;
  const access = await pageAction(`/w/${slug}/builds/${id}/edit`);
  const buildId = parsePathId(id);
  const stored = buildId ? await findStoredBuild(access.workspace.id, buildId) : null;
  if (!stored) notFound();
  const data = await buildPageData(access.workspace.id);
  return (
    <section className="max-w-4xl space-y-4">
      <h1 className="text-2xl font-bold">Edit the record of {stored.build.customerName}</h1>
      <BuildForm slug={slug} build={stored.build} fields={stored.fields} templates={data.templates} technicians={data.technicians} toleranceDeg={data.toleranceDeg} locale={(await requestDateFormat()).locale} />
    </section>
  );
}
