import 'server-only';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { sheetFileName } from '@/lib/sheet/sheet-file-name';
import type { SheetRequest } from '@/lib/sheet/sheet-request';
import { dayStart } from '@/pdf/pdf-job';
import { jsonError } from './api';
import { PdfPoolBusy, renderPdf } from './pdf-pool';

const CONTENT_TYPE: Record<SheetRequest['format'], string> = {
  svg: 'image/svg+xml; charset=utf-8',
  pdf: 'application/pdf',
};

/** Today in UTC (YYYY-MM-DD): the date a sheet drawn now carries in its title block. */
export function sheetDay(now = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/** The body of a sheet: SVG drawn here (a millisecond or two), PDF in the worker pool. */
export async function renderSheetBody(sheet: SheetRequest, day: string): Promise<Uint8Array | string> {
  if (sheet.format === 'svg') return renderSvg(buildDrawing(sheet, { date: dayStart(day) }));
  return renderPdf({ kind: 'sheet', props: { request: sheet, day } });
}

/** A validated sheet request drawn and answered as a PDF or SVG download (the public and the template routes alike). */
export async function sheetDownloadResponse(sheet: SheetRequest): Promise<Response> {
  let body: Uint8Array | string;
  try {
    body = await renderSheetBody(sheet, sheetDay());
  } catch (error) {
    if (!(error instanceof PdfPoolBusy)) throw error;
    const busy = jsonError(503, 'The server is busy drawing other sheets. Try again in a moment.');
    busy.headers.set('Retry-After', String(error.retryAfterS));
    return busy;
  }
  return new Response(body as BodyInit, {
    status: 200,
    headers: {
      'Content-Type': CONTENT_TYPE[sheet.format],
      'Content-Disposition': `attachment; filename="${sheetFileName(sheet)}"`,
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
    },
  });
}
