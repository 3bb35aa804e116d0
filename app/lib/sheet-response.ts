import 'server-only';
import type { DateFormat } from '@/lib/format/date-format';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { sheetFileName } from '@/lib/sheet/sheet-file-name';
import type { SheetRequest } from '@/lib/sheet/sheet-request';
import { renderSheetPdf } from '@/pdf/render-sheet-pdf';

const CONTENT_TYPE: Record<SheetRequest['format'], string> = {
  svg: 'image/svg+xml; charset=utf-8',
  pdf: 'application/pdf',
};

/**
 * A validated sheet request drawn and answered as a PDF or SVG download (the public and the template routes alike),
 * its date written in the reader's `dateFormat`.
 */
export async function sheetDownloadResponse(sheet: SheetRequest, dateFormat: DateFormat): Promise<Response> {
  const drawing = buildDrawing(sheet, { dateFormat });
  const body = sheet.format === 'svg' ? renderSvg(drawing) : new Uint8Array(await renderSheetPdf(drawing));
  return new Response(body, {
    status: 200,
    headers: {
      'Content-Type': CONTENT_TYPE[sheet.format],
      'Content-Disposition': `attachment; filename="${sheetFileName(sheet)}"`,
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
      // What the layout could not draw as asked, and why (also printed on the sheet): percent-encoded JSON list.
      'X-Sheet-Layout-Notes': encodeURIComponent(JSON.stringify(drawing.warnings)),
    },
  });
}
