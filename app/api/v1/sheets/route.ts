import { jsonError, parseJsonBody } from '@/app/lib/api';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { sheetFileName } from '@/lib/sheet/sheet-file-name';
import { sheetRequestSchema, type SheetRequest } from '@/lib/sheet/sheet-request';
import { renderSheetPdf } from '@/pdf/render-sheet-pdf';

// react-pdf reads the TTFs from fonts/ and uses Node buffers.
export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

const CONTENT_TYPE: Record<SheetRequest['format'], string> = {
  svg: 'image/svg+xml; charset=utf-8',
  pdf: 'application/pdf',
};

/**
 * POST /api/v1/sheets: a sheet request (JSON, lib/sheet/sheet-request.ts) in, the
 * drawing as a PDF (default) or SVG download out.
 * Public on purpose, so no session or role check: the generator serves visitors
 * without an account (PRODUCT.md §1, issue 3), and it reads and writes no stored data.
 */
export async function POST(request: Request): Promise<Response> {
  try {
    const parsed = await parseJsonBody(request, sheetRequestSchema);
    if (!parsed.ok) return parsed.response;
    return await sheetResponse(parsed.data);
  } catch (error) {
    // Never a stack trace to the caller; the message stays in the server log.
    console.error('POST /api/v1/sheets failed:', error instanceof Error ? error.message : String(error));
    return jsonError(500, 'The sheet could not be drawn. Try other values; if it keeps failing, report it.');
  }
}

async function sheetResponse(sheet: SheetRequest): Promise<Response> {
  const drawing = buildDrawing(sheet);
  const body = sheet.format === 'svg' ? renderSvg(drawing) : new Uint8Array(await renderSheetPdf(drawing));
  return new Response(body, {
    status: 200,
    headers: {
      'Content-Type': CONTENT_TYPE[sheet.format],
      'Content-Disposition': `attachment; filename="${sheetFileName(sheet)}"`,
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
    },
  });
}
