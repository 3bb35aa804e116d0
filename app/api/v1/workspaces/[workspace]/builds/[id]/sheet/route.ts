import { z } from 'zod';
import { dateFormatOf } from '@/app/lib/date-format';
import { jsonError } from '@/app/lib/api';
import { guarded } from '@/app/lib/route-handler';
import { profileChoiceSchema, sheetCorrection } from '@/app/lib/sheet-printer-profile';
import { sheetDownloadResponse } from '@/app/lib/sheet-response';
import { findTemplate } from '@/db/templates/find-template';
import { buildSheetKinds, buildSheetRequest } from '@/lib/builds/build-sheet';
import { sheetRequestSchema, toFieldIssues } from '@/lib/sheet/sheet-request';
import { storedSheetQueryShape } from '@/lib/templates/sheet-query';
import { buildFor, type BuildParams } from '../../_shared/build-responses';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const querySchema = z.object({
  ...storedSheetQueryShape,
  profile: profileChoiceSchema,
});

/**
 * GET …/builds/[id]/sheet?kind=wheel|ring|strip&format=pdf|svg&profile=default|none|id — a sheet for this
 * engine (sheet.print): the template's diameters, the timing as set as the advance mark, the measured
 * TDC correction as the note, corrected by the workspace's default printer profile unless told otherwise.
 */
export async function GET(request: Request, { params }: BuildParams): Promise<Response> {
  return guarded(async () => {
    const { access, build } = await buildFor(params, 'sheet.print');
    const query = querySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
    if (!query.success) return jsonError(400, 'Some query parameters are not valid', toFieldIssues(query.error));
    const template = build.templateId ? await findTemplate(access.workspace.id, build.templateId) : null;
    if (!template) return jsonError(400, 'This record has no template to take the flywheel diameters from', [{ path: 'templateId', message: 'Choose the template the engine was built from' }]);
    const kind = query.data.kind ?? buildSheetKinds(template)[0];
    const input = kind ? buildSheetRequest(template, build, kind) : null;
    if (!input) return jsonError(400, `The template has no diameters for a ${kind ?? 'sheet'}`, [{ path: 'kind', message: `This record can print: ${buildSheetKinds(template).join(', ') || 'nothing yet'}` }]);
    const correction = await sheetCorrection(access.workspace.id, query.data.profile);
    if (!correction) return jsonError(400, 'No such printer profile in this workspace', [{ path: 'profile', message: 'Use default, none or the id of one of this workspace’s profiles' }]);
    const sheet = sheetRequestSchema.safeParse({ ...input, ...correction, format: query.data.format });
    if (!sheet.success) return jsonError(400, 'The record’s figures do not make a valid sheet', toFieldIssues(sheet.error));
    // The record's and the template's versions are part of the cache key: an edit of either draws afresh.
    const record = `build:${build.id}@v${build.version}/template:${template.id}@v${template.version}`;
    return sheetDownloadResponse(sheet.data, dateFormatOf(request), { request, record });
  });
}
