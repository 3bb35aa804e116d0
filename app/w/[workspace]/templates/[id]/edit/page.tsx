import { parsePathId } from '@/lib/path-id';
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { pageAction } from '@/app/lib/page-access';
import { TemplateForm } from '@/components/templates/template-form';
import { findTemplate } from '@/db/templates/find-template';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Edit template' };

type Props = { params: Promise<{ workspace: string; id: string }> };

export default async function EditTemplatePage({ params }: Props) {
  const { workspace: slug, id } = await params;
  const access = await pageAction(`/w/${slug}/templates/${id}/edit`);
  const templateId = parsePathId(id);
  const template = templateId ? await findTemplate(access.workspace.id, templateId) : null;
  if (!template) notFound();
  return (
    <section className="max-w-3xl space-y-4">
      <h1 className="text-2xl font-bold">Edit {template.name}</h1>
      <p className="text-sm text-steel-600">
        Version {template.version}. If someone else saves first, your save is refused and your edits stay in the form.
      </p>
      <TemplateForm slug={slug} template={template} />
    </section>
  );
}
