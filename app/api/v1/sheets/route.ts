import { jsonError, parseJsonBody } from '@/app/lib/api';
import { dateFormatOf } from '@/app/lib/date-format';
import { guarded } from '@/app/lib/route-handler';
import { sheetDownloadResponse } from '@/app/lib/sheet-response';
import { sheetRequestSchema } from '@/lib/sheet/sheet-request';

// Node, not the edge: the PDF worker pool runs in worker threads and the cache holds Node buffers.
export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/**
 * POST /api/v1/sheets: a sheet request (JSON, lib/sheet/sheet-request.ts) in, the
 * drawing as a PDF (default) or SVG download out; a repeat comes from the sheet cache,
 * and a repeat with the ETag in If-None-Match is a 304 without a body.
 * Public on purpose, so no session or role check: the generator serves visitors
 * without an account (DEVELOPERS.md, "Public pages"), and it reads and writes no stored data.
 */
export async function POST(incoming: Request): Promise<Response> {
  return guarded(incoming, {}, async (request) => {
    const parsed = await parseJsonBody(request, sheetRequestSchema);
    if (!parsed.ok) return parsed.response;
    try {
      return await sheetDownloadResponse(parsed.data, dateFormatOf(request), { request });
    } catch (error) {
      // Never a stack trace to the caller; the message stays in the server log.
      console.error('POST /api/v1/sheets failed:', error instanceof Error ? error.message : String(error));
      return jsonError(500, 'The sheet could not be drawn. Try other values; if it keeps failing, report it.');
    }
  });
}
