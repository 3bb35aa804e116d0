import { z } from 'zod';
import { parseJsonBody } from '@/app/lib/api';
import { updateTemplate } from '@/db/templates/update-template';
import { versionSchema } from '@/lib/templates/template-schema';
import { guarded } from '@/app/lib/route-handler';
import { type TemplateParams } from '../../_shared/template-params';
import { updateResponse } from '../../_shared/responses';
import { templateFor } from '../../_shared/template-for';
import { dateFormatOf } from '@/app/lib/date-format';

const archiveSchema = z.object({ version: versionSchema.optional(), archived: z.boolean().default(true) }).strict();

/**
 * POST …/templates/[id]/archive — technician or above. Body `{ version?, archived? }`:
 * archives (or with `archived: false` restores to the list); with a version, a stale one answers 409.
 */
export async function POST(incoming: Request, { params }: TemplateParams): Promise<Response> {
  return guarded(incoming, {}, async (request) => {
    const { access, template: current } = await templateFor(params, 'template.edit');
    // An empty body means "archive at whatever version it is now".
    const text = await request.text();
    const body = await parseJsonBody(new Request(request.url, { method: 'POST', body: text.trim() || '{}' }), archiveSchema);
    if (!body.ok) return body.response;
    const version = body.data.version ?? current.version;
    return updateResponse(
      await updateTemplate(access.workspace.id, current.id, access.user.id, version, { archived: body.data.archived }),
      dateFormatOf(request),
    );
  });
}
