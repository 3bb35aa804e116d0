import 'server-only';
import type { DateFormat } from '@/lib/format/date-format';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { strToU8, zipSync } from 'fflate';
import type { Drawing } from '@/lib/sheet/drawing';
import { renderSvg, renderSvgPage } from '@/lib/sheet/render-svg';
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
  const file = await sheetFile(sheet, drawing);
  return new Response(file.body, {
    status: 200,
    headers: {
      'Content-Type': file.contentType,
      'Content-Disposition': `attachment; filename="${file.name}"`,
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
      // What the layout could not draw as asked, and why (also printed on the sheet): percent-encoded JSON list.
      'X-Sheet-Layout-Notes': encodeURIComponent(JSON.stringify(drawing.warnings)),
    },
  });
}

/**
 * The file: a PDF (one page per layout page), one plain SVG for a one-page sheet, or for a
 * multi-page sheet a ZIP of one true-size SVG per page (page-01.svg, page-02.svg, …), so no
 * page is lost in one unpaged canvas.
 */
async function sheetFile(sheet: SheetRequest, drawing: Drawing): Promise<{ body: string | Uint8Array<ArrayBuffer>; contentType: string; name: string }> {
  const name = sheetFileName(sheet);
  if (sheet.format === 'pdf') return { body: new Uint8Array(await renderSheetPdf(drawing)), contentType: CONTENT_TYPE.pdf, name };
  if (drawing.pages.length === 1) return { body: renderSvg(drawing), contentType: CONTENT_TYPE.svg, name };
  const digits = String(drawing.pages.length).length;
  const files: Record<string, Uint8Array> = {};
  drawing.pages.forEach((_, i) => (files[`page-${String(i + 1).padStart(Math.max(2, digits), '0')}.svg`] = strToU8(renderSvgPage(drawing, i))));
  return { body: new Uint8Array(zipSync(files, { level: 6 })), contentType: 'application/zip', name: name.replace(/\.svg$/, '.zip') };
}
