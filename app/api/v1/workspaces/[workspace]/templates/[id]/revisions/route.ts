import { listRevisions } from '@/db/templates/revisions';
import { handle, type TemplateParams } from '../../_shared/handle';
import { templateFor } from '../../_shared/template-for';

/** GET …/templates/[id]/revisions — the history, newest first: who, when, fields old → new. Viewer or above. */
export async function GET(_request: Request, { params }: TemplateParams): Promise<Response> {
  return handle(async () => {
    const { template } = await templateFor(params, 'viewer');
    return Response.json({ revisions: await listRevisions(template.id) });
  });
}
