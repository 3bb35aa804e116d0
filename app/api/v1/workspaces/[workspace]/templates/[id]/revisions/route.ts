import { listRevisions } from '@/db/templates/revisions';
import { guarded } from '@/app/lib/route-handler';
import { type TemplateParams } from '../../_shared/template-params';
import { templateFor } from '../../_shared/template-for';

/** GET …/templates/[id]/revisions — the history, newest first: who, when, fields old → new. Needs template.read. */
export async function GET(_request: Request, { params }: TemplateParams): Promise<Response> {
  return guarded(async () => {
    const { template } = await templateFor(params, 'template.read');
    return Response.json({ revisions: await listRevisions(template.id) });
  });
}
