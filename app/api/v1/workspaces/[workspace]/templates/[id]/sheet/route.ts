import { z } from 'zod';
import { jsonError } from '@/app/lib/api';
import { dateFormatOf } from '@/app/lib/date-format';
import { sheetDownloadResponse } from '@/app/lib/sheet-response';
import { profileChoiceSchema, sheetCorrection } from '@/app/lib/sheet-printer-profile';
import { sheetRequestFields } from '@/lib/sheet/sheet-request-fields';
import { sheetRequestSchema, toFieldIssues } from '@/lib/sheet/sheet-request';
import { storedSheetQueryShape } from '@/lib/templates/sheet-query';
import { availableSheetKinds, sheetNeeds, templateSheetRequest } from '@/lib/templates/template-sheet';
import { guarded } from '@/app/lib/route-handler';
import { type TemplateParams } from '../../_shared/template-params';
import { templateFor } from '../../_shared/template-for';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const querySchema = z.object({
  ...storedSheetQueryShape,
  numbering: sheetRequestFields.numbering.schema,
  profile: profileChoiceSchema,
});

/**
 * GET …/templates/[id]/sheet?kind=wheel|ring|strip&format=pdf|svg&numbering=split|full&profile=default|none|id — a sheet
 * drawn from the template (viewer or above: viewers may print). Without `kind`, the first the
 * template’s diameters allow. Corrected by the workspace's default printer profile unless `profile`
 * names another or none; the title block names the profile. Same drawing and file name as the public sheets route.
 */
export async function GET(request: Request, { params }: TemplateParams): Promise<Response> {
  return guarded(async () => {
    const { access, template } = await templateFor(params, 'sheet.print');
    const query = querySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
    if (!query.success) return jsonError(400, 'Some query parameters are not valid', toFieldIssues(query.error));

    const kinds = availableSheetKinds(template);
    const kind = query.data.kind ?? kinds[0];
    if (!kind) return jsonError(400, 'This template has no diameters to draw a sheet from', [{ path: 'kind', message: 'Add a face or rim diameter to the template' }]);
    const input = templateSheetRequest(template, kind, { numbering: query.data.numbering });
    if (!input) return jsonError(400, `A ${kind} sheet needs ${sheetNeeds(kind)} in the template`, [{ path: 'kind', message: `This template can print: ${kinds.join(', ') || 'nothing yet'}` }]);
    const correction = await sheetCorrection(access.workspace.id, query.data.profile);
    if (!correction) return jsonError(400, 'No such printer profile in this workspace', [{ path: 'profile', message: 'Use default, none or the id of one of this workspace’s profiles' }]);
    const sheet = sheetRequestSchema.safeParse({ ...input, ...correction, format: query.data.format });
    if (!sheet.success) return jsonError(400, 'The template’s figures do not make a valid sheet', toFieldIssues(sheet.error));

    // The template's version is part of the cache key: an edit draws afresh.
    return sheetDownloadResponse(sheet.data, dateFormatOf(request), { request, record: `template:${template.id}@v${template.version}` });
  });
}
