import 'server-only';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { sheetFileName } from '@/lib/sheet/sheet-file-name';
import type { SheetRequest } from '@/lib/sheet/sheet-request';
import { dayStart } from '@/pdf/pdf-job';
import { jsonError } from './api';
import { PdfPoolBusy, renderPdf } from './pdf-pool';
import { cachedSheet, matchesIfNoneMatch, sheetCacheKey } from './sheet-cache';

const CONTENT_TYPE: Record<SheetRequest['format'], string> = {
  svg: 'image/svg+xml; charset=utf-8',
  pdf: 'application/pdf',
};

/**
 * Browsers may keep a sheet but must ask again before using it (RFC 9111 §5.2.2.4):
 * the answer is a 304 while it is unchanged. `private`: template sheets belong to
 * a signed-in member, so no shared cache keeps them.
 */
const CACHE_CONTROL = 'private, no-cache';

/** Today in UTC (YYYY-MM-DD): the date a sheet drawn now carries in its title block. */
export function sheetDay(now = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/** The body of a sheet: SVG drawn here (a millisecond or two), PDF in the worker pool. */
export async function renderSheetBody(sheet: SheetRequest, day: string): Promise<Uint8Array | string> {
  if (sheet.format === 'svg') return renderSvg(buildDrawing(sheet, { date: dayStart(day) }));
  return renderPdf({ kind: 'sheet', props: { request: sheet, day } });
}

type DownloadOptions = {
  /** The incoming request, for its If-None-Match. */
  request?: Request;
  /** A stored record the sheet is drawn from, with its version ('template:12@v3'): part of the cache key. */
  record?: string;
  /** The sheet's date (YYYY-MM-DD); today in UTC unless given. */
  day?: string;
};

function busyResponse(error: PdfPoolBusy): Response {
  const busy = jsonError(503, 'The server is busy drawing other sheets. Try again in a moment.');
  busy.headers.set('Retry-After', String(error.retryAfterS));
  return busy;
}

/**
 * A validated sheet request answered as a PDF or SVG download (the public and the template
 * routes alike): from the cache when the same sheet was drawn before, with a strong ETag,
 * and as 304 Not Modified without a body when the caller already holds those bytes.
 */
export async function sheetDownloadResponse(sheet: SheetRequest, options: DownloadOptions = {}): Promise<Response> {
  const day = options.day ?? sheetDay();
  const key = sheetCacheKey({ request: sheet, day, ...(options.record ? { record: options.record } : {}) });
  let entry;
  try {
    entry = await cachedSheet(key, () => renderSheetBody(sheet, day));
  } catch (error) {
    if (error instanceof PdfPoolBusy) return busyResponse(error);
    throw error;
  }
  const validators = { ETag: entry.etag, 'Cache-Control': CACHE_CONTROL };
  if (matchesIfNoneMatch(options.request?.headers.get('if-none-match') ?? null, entry.etag))
    return new Response(null, { status: 304, headers: validators });
  return new Response(entry.body as Uint8Array<ArrayBuffer>, {
    status: 200,
    headers: {
      ...validators,
      'Content-Type': CONTENT_TYPE[sheet.format],
      'Content-Disposition': `attachment; filename="${sheetFileName(sheet)}"`,
      'X-Content-Type-Options': 'nosniff',
    },
  });
}
