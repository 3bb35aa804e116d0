import { parsePathId } from '@/lib/path-id';
import { z } from 'zod';
import { parseJsonBody } from '@/app/lib/api';
import { revisionSnapshot } from '@/db/templates/revisions';
import { updateTemplate } from '@/db/templates/update-template';
import { versionSchema } from '@/lib/templates/template-schema';
import { guarded } from '@/app/lib/route-handler';
import { templateNotFound } from '../../../../_shared/template-params';
import { updateResponse } from '../../../../_shared/responses';
import { templateFor } from '../../../../_shared/template-for';
import { dateFormatOf } from '@/app/lib/date-format';

type Params = { params: Promise<{ workspace: string; id: string; version: string }> };

const restoreSchema = z.object({ version: versionSchema }).strict();

/**
 * POST …/templates/[id]/revisions/[version]/restore — body `{ version }` (the current version the
 * caller saw). Brings back the template as it was at revision [version], recorded as a new revision.
 */
export async function POST(incoming: Request, { params }: Params): Promise<Response> {
  return guarded(incoming, {}, async (request) => {
    const { access, template } = await templateFor(params, 'template.edit');
    const revision = parsePathId((await params).version);
    const snapshot = revision ? await revisionSnapshot(template.id, revision) : null;
    if (!snapshot || !revision) return templateNotFound();
    const body = await parseJsonBody(request, restoreSchema);
    if (!body.ok) return body.response;
    return updateResponse(
      await updateTemplate(access.workspace.id, template.id, access.user.id, body.data.version, snapshot, {
        action: 'restore',
        restoredFromVersion: revision,
      }),
      dateFormatOf(request),
    );
  });
}
