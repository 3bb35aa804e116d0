import { createHash } from 'node:crypto';
import { jsonError } from '@/app/lib/api';
import { requireAction } from '@/app/lib/authz';
import { readBodyBytes } from '@/app/lib/request-body';
import { dateFormatOf } from '@/app/lib/date-format';
import { guarded } from '@/app/lib/route-handler';
import { recordAudit } from '@/db/audit-log';
import { findImportReceipt, saveImportReceipt, type ImportReceipt } from '@/db/import-receipts';
import { importTemplates, planImport, type ImportCounts, type OnMatch } from '@/db/templates/import-templates';
import { decodeCsvBytes } from '@/lib/csv/decode-csv-bytes';
import { DELIMITER_NAMES } from '@/lib/csv/detect-delimiter';
import { importChoiceNeededMessage, importDoneMessage, importPreviewMessage, importProblemsMessage } from '@/lib/templates/import-messages';
import { parseTemplatesCsv, type CsvProblem } from '@/lib/templates/template-csv';
import { type WorkspaceParams } from '../_shared/template-params';

const MAX_IMPORT_BYTES = 16 * 1024 * 1024;
/** Room for the multipart boundaries and the choice fields around the file. */
const MULTIPART_OVERHEAD_BYTES = 64 * 1024;

function tooLarge(): Response {
  return jsonError(413, 'The CSV is larger than 16 MiB', [{ path: 'file', message: 'At most 16 MiB per import' }]);
}

type Upload = { bytes: Uint8Array; charset: string | null; fields: URLSearchParams };

function charsetOf(contentType: string): string | null {
  return /;\s*charset="?([^";\s]+)"?/i.exec(contentType)?.[1] ?? null;
}

/** The file's bytes and the choices: query parameters, overridden by form fields of a multipart upload. */
async function readUpload(request: Request): Promise<Upload | Response> {
  const fields = new URL(request.url).searchParams;
  const type = request.headers.get('content-type') ?? '';
  if (!type.toLowerCase().startsWith('multipart/form-data'))
    return { bytes: await readBodyBytes(request, MAX_IMPORT_BYTES), charset: charsetOf(type), fields };
  const form = await request.formData();
  const file = form.get('file');
  if (!(file instanceof Blob)) return jsonError(400, 'No CSV file in the upload', [{ path: 'file', message: 'Add a "file" field with the CSV' }]);
  if (file.size > MAX_IMPORT_BYTES) return tooLarge();
  for (const name of ['preview', 'onMatch', 'matchVersions']) {
    const value = form.get(name);
    if (typeof value === 'string' && value !== '') fields.set(name, value);
  }
  return { bytes: new Uint8Array(await file.arrayBuffer()), charset: charsetOf(file.type), fields };
}

type Choices = { preview: boolean; onMatch: OnMatch | null; expectedVersions?: Record<string, number> };

function readChoices(fields: URLSearchParams): Choices | Response {
  const onMatch = fields.get('onMatch');
  if (onMatch !== null && onMatch !== 'skip' && onMatch !== 'update')
    return jsonError(400, 'Some fields are not valid', [{ path: 'onMatch', message: 'On a name match must be one of: skip, update' }]);
  const versions = fields.get('matchVersions');
  let expectedVersions: Record<string, number> | undefined;
  if (versions) {
    try {
      expectedVersions = JSON.parse(versions) as Record<string, number>;
      if (typeof expectedVersions !== 'object' || expectedVersions === null || Object.values(expectedVersions).some((v) => !Number.isInteger(v))) throw new Error();
    } catch {
      return jsonError(400, 'Some fields are not valid', [{ path: 'matchVersions', message: 'Versions seen in the preview must be a JSON object of template id → version' }]);
    }
  }
  return { preview: ['1', 'true'].includes(fields.get('preview') ?? ''), onMatch, expectedVersions };
}

/** An Idempotency-Key header (IETF httpapi draft): 1–255 visible ASCII characters. */
function idempotencyKey(request: Request): string | null | Response {
  const key = request.headers.get('idempotency-key');
  if (key === null) return null;
  if (/^[\x21-\x7e]{1,255}$/.test(key)) return key;
  return jsonError(400, 'The Idempotency-Key header is not valid', [{ path: '(header)', message: 'Idempotency-Key must be 1–255 visible ASCII characters' }]);
}

function problemsResponse(problems: CsvProblem[], locale: string): Response {
  const shown = problems.slice(0, 500);
  return Response.json(
    {
      error: importProblemsMessage(problems.length, locale),
      issues: shown.map((p) => ({ path: `row ${p.row}.${p.column}`, message: p.message })),
      problems: shown,
      problemCount: problems.length,
    },
    { status: 400 },
  );
}

function replay(receipt: ImportReceipt, bodySha256: string): Response {
  if (receipt.bodySha256 !== bodySha256)
    return jsonError(422, 'This Idempotency-Key was used for another import; use a new key for a new file', [
      { path: '(header)', message: 'Idempotency-Key belongs to a different request' },
    ]);
  return Response.json(receipt.body, { status: receipt.status, headers: { 'Idempotent-Replayed': 'true' } });
}

const doneBody = (counts: ImportCounts, locale: string) => ({ imported: counts.created + counts.updated, ...counts, message: importDoneMessage(counts, locale) });

/**
 * POST …/templates/import — template.import. The CSV as text/csv (charset= honoured) or as the
 * `file` field of multipart/form-data; comma, semicolon or tab separated. Every row is validated
 * first; any problem answers 400 with `problems: [{ row, column, message }]` and nothing is written.
 * `preview=1` answers 200 with how many rows are new and which match a template by name, writing
 * nothing. Otherwise rows with a new name are created, and matching rows are skipped or update
 * their template (`onMatch=skip|update`; without it and with matches, 409); `matchVersions`
 * (id → version from the preview) turns a template changed since into a 409. All or nothing: 201.
 * With an `Idempotency-Key` header a repeated request gets the first answer again.
 */
export async function POST(incoming: Request, { params }: WorkspaceParams): Promise<Response> {
  return guarded(incoming, { accepts: ['csv', 'multipart'], maxBytes: MAX_IMPORT_BYTES + MULTIPART_OVERHEAD_BYTES, tooLarge }, async (request) => {
    const { workspace } = await params;
    const access = await requireAction(workspace, 'template.import');
    const { locale } = dateFormatOf(request);
    const key = idempotencyKey(request);
    if (key instanceof Response) return key;
    const upload = await readUpload(request);
    if (upload instanceof Response) return upload;
    const choices = readChoices(upload.fields);
    if (choices instanceof Response) return choices;

    const decoded = decodeCsvBytes(upload.bytes, upload.charset);
    if (!decoded.ok) return problemsResponse([{ row: decoded.row, column: '(encoding)', message: decoded.message }], locale);
    const parsed = parseTemplatesCsv(decoded.text);
    if (!parsed.ok) return problemsResponse(parsed.problems, locale);

    const plan = await planImport(access.workspace.id, parsed.templates);
    const planBody = { rows: plan.rows, newRows: plan.newRows, matchingRows: plan.matches.length, matches: plan.matches.slice(0, 500) };
    if (choices.preview)
      return Response.json({
        preview: true,
        separatedBy: DELIMITER_NAMES[parsed.delimiter],
        ...planBody,
        message: importPreviewMessage(plan.rows, plan.newRows, plan.matches.length, locale),
      });

    const bodySha256 = createHash('sha256')
      .update(upload.bytes)
      .update(JSON.stringify([choices.onMatch, choices.expectedVersions ?? null]))
      .digest('hex');
    if (key) {
      const receipt = await findImportReceipt(access.workspace.id, key);
      if (receipt) return replay(receipt, bodySha256);
    }
    if (plan.matches.length > 0 && !choices.onMatch) return Response.json({ error: importChoiceNeededMessage(plan.matches.length, locale), issues: [], ...planBody }, { status: 409 });

    let outcome;
    try {
      outcome = await importTemplates(access.workspace.id, access.user.id, parsed.templates, {
        onMatch: choices.onMatch ?? 'skip',
        fields: parsed.fields,
        expectedVersions: choices.expectedVersions,
        afterWrite: key
          ? (trx, counts) => saveImportReceipt(trx, { workspaceId: access.workspace.id, key, userId: access.user.id, bodySha256, status: 201, body: doneBody(counts, locale) })
          : undefined,
      });
    } catch (err) {
      // Another request with the same key committed first: answer as it did.
      const receipt = key ? await findImportReceipt(access.workspace.id, key) : null;
      if (receipt) return replay(receipt, bodySha256);
      throw err;
    }
    if (outcome.ok) {
      await recordAudit({
        action: 'templates-imported',
        actorUserId: access.user.id,
        workspaceId: access.workspace.id,
        detail: { count: outcome.counts.created, updated: outcome.counts.updated },
      });
      return Response.json(doneBody(outcome.counts, locale), { status: 201 });
    }
    if (outcome.reason === 'invalid') return problemsResponse(outcome.problems, locale);
    const names = outcome.conflicts.map((c) => `${c.name} (row ${c.row})`).join(', ');
    return Response.json(
      { error: `Changed by someone since the preview: ${names}. Check the file again; nothing was imported.`, issues: [], conflicts: outcome.conflicts },
      { status: 409 },
    );
  });
}
