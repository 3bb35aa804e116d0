import { jsonError } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { recordAudit } from '@/db/audit-log';
import { importTemplates } from '@/db/templates/import-templates';
import { parseTemplatesCsv } from '@/lib/templates/template-csv';
import { guarded } from '@/app/lib/route-handler';
import { type WorkspaceParams } from '../_shared/template-params';

const MAX_IMPORT_BYTES = 16 * 1024 * 1024;

async function csvText(request: Request): Promise<string | Response> {
  const type = request.headers.get('content-type') ?? '';
  if (type.startsWith('multipart/form-data')) {
    const file = (await request.formData()).get('file');
    if (!(file instanceof Blob)) return jsonError(400, 'No CSV file in the upload', [{ path: 'file', message: 'Add a "file" field with the CSV' }]);
    if (file.size > MAX_IMPORT_BYTES) return tooLarge();
    return file.text();
  }
  if (type.startsWith('text/csv') || type.startsWith('text/plain')) {
    const text = await request.text();
    return Buffer.byteLength(text) > MAX_IMPORT_BYTES ? tooLarge() : text;
  }
  return jsonError(415, 'Send the CSV as text/csv or multipart/form-data', [{ path: '(body)', message: 'Content-Type must be text/csv or multipart/form-data' }]);
}

function tooLarge(): Response {
  return jsonError(413, 'The CSV is larger than 16 MB', [{ path: 'file', message: 'At most 16 MB per import' }]);
}

/**
 * POST …/templates/import — technician or above. Every row is validated first; if any
 * fails the answer is 400 with `problems: [{ row, column, message }]` and nothing is written.
 * Otherwise all rows go in one transaction: 201 `{ imported }`.
 */
export async function POST(request: Request, { params }: WorkspaceParams): Promise<Response> {
  return guarded(async () => {
    const { workspace } = await params;
    const access = await requireAction(workspace, 'template.import');
    if (Number(request.headers.get('content-length') ?? '0') > MAX_IMPORT_BYTES + 64 * 1024) return tooLarge();
    const text = await csvText(request);
    if (text instanceof Response) return text;
    const parsed = parseTemplatesCsv(text);
    if (!parsed.ok) {
      const shown = parsed.problems.slice(0, 500);
      return Response.json(
        {
          error: `The CSV has ${parsed.problems.length} problem(s); nothing was imported`,
          issues: shown.map((p) => ({ path: `row ${p.row}.${p.column}`, message: p.message })),
          problems: shown,
          problemCount: parsed.problems.length,
        },
        { status: 400 },
      );
    }
    const ids = await importTemplates(access.workspace.id, access.user.id, parsed.templates);
    await recordAudit({ action: 'templates-imported', actorUserId: access.user.id, workspaceId: access.workspace.id, detail: { count: ids.length } });
    return Response.json({ imported: ids.length }, { status: 201 });
  });
}
