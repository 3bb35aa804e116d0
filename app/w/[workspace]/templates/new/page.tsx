import type { Metadata } from 'next';
import { pageAction } from '@/app/lib/page-access';
import { TemplateForm } from '@/components/templates/template-form';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'New template' };

type Props = { params: Promise<{ workspace: string }> };

export default async function NewTemplatePage({ params }: Props) {
  const { workspace: slug } = await params;
  await pageAction(`/w/${slug}/templates/new`);
  return (
    <section className="max-w-3xl space-y-4">
      <h1 className="text-2xl font-bold">New engine template</h1>
      <TemplateForm slug={slug} template={null} />
    </section>
  );
}
