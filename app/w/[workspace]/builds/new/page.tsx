import type { Metadata } from 'next';
import { buildPageData } from '@/app/lib/build-page-data';
import { requestDateFormat } from '@/app/lib/date-format';
import { pageAction } from '@/app/lib/page-access';
import { BuildForm } from '@/components/builds/build-form';
import { emptyBuild } from '@/lib/builds/build-schema';
import { templatePrefill } from '@/lib/builds/template-prefill';
import { parsePathId } from '@/lib/path-id';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'New build record' };

type Props = { params: Promise<{ workspace: string }>; searchParams: Promise<{ template?: string }> };

/** A new record; `?template=ID` starts it from that template's figures. */
export default async function NewBuildPage({ params, searchParams }: Props) {
  const { workspace: slug } = await params;
  const access = await pageAction(`/w/${slug}/builds/new`);
  const data = await buildPageData(access.workspace.id);
  const templateId = parsePathId((await searchParams).template ?? '');
  const template = data.templates.find((t) => t.id === templateId);
  const start = emptyBuild(new Date().toISOString().slice(0, 10));
  const fields = template
    ? { ...start, ...templatePrefill(template), ports: template.portTargets.map((p) => ({ name: p.name, heightMm: null as unknown as number })) }
    : start;
  return (
    <section className="max-w-4xl space-y-4">
      <h1 className="text-2xl font-bold">New build record{template ? `: ${template.name}` : ''}</h1>
      <BuildForm slug={slug} build={null} fields={fields} templates={data.templates} technicians={data.technicians} toleranceDeg={data.toleranceDeg} locale={(await requestDateFormat()).locale} />
    </section>
  );
}
