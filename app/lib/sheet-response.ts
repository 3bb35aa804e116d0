import 'server-only';
import type { DateFormat } from '@/lib/format/date-format';
import { dateTimeFormat } from '@/lib/format/intl-formatters';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { strToU8, zipSync } from 'fflate';
import type { Drawing } from '@/lib/sheet/drawing';
import { renderSvg, renderSvgPage } from '@/lib/sheet/render-svg';
import { sheetFileName } from '@/lib/sheet/sheet-file-name';
import { dayFormat, dayStart } from '@/lib/sheet/sheet-day';
import type { SheetRequest } from '@/lib/sheet/sheet-request';
import { pdfPoolBusyResponse, renderPdf } from './pdf-pool';
import { cachedSheet, matchesIfNoneMatch, sheetCacheKey, type DrawnSheet } from './sheet-cache';

const CONTENT_TYPE: Record<SheetRequest['format'], string> = {
  svg: 'image/svg+xml; charset=utf-8',
  pdf: 'application/pdf',
};

/**
 * Browsers may keep a sheet but must ask again before using it (RFC 9111 §5.2.2.4):
 * the answer is a 304 while it is unchanged. `private`: template and build sheets
 * belong to a signed-in member, so no shared cache keeps them.
 */
const CACHE_CONTROL = 'private, no-cache';

/** Today (YYYY-MM-DD) in the reader's time zone: the date a sheet drawn now carries in its title block. */
export function sheetDay(dateFormat: DateFormat, now = new Date()): string {
  // en-CA writes the calendar date as YYYY-MM-DD.
  return dateTimeFormat('en-CA', { timeZone: dateFormat.timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(now);
}

/** A sheet drawn for a day: SVG here (a millisecond or two), PDF in the worker pool. */
export async function drawSheet(sheet: SheetRequest, day: string, locale: string): Promise<DrawnSheet> {
  if (sheet.format === 'svg') {
    const drawing = buildDrawing(sheet, { date: dayStart(day), dateFormat: dayFormat(locale) });
    return { body: svgFile(drawing), notes: drawing.warnings };
  }
  const { bytes, notes } = await renderPdf({ kind: 'sheet', props: { request: sheet, day, locale } });
  return { body: bytes, notes };
}

type DownloadOptions = {
  /** The incoming request, for its If-None-Match. */
  request?: Request;
  /** The stored records the sheet is drawn from, with their versions ('template:12@v3'): part of the cache key. */
  record?: string;
  /** The sheet's date (YYYY-MM-DD); today in the reader's time zone unless given. */
  day?: string;
};

/**
 * A validated sheet request answered as a PDF or SVG download (the public, template and build
 * routes alike), its date written in the reader's `dateFormat`: from the cache when the same sheet
 * was drawn before, with a strong ETag, and as 304 Not Modified without a body when the caller
 * already holds those bytes.
 */
export async function sheetDownloadResponse(sheet: SheetRequest, dateFormat: DateFormat, options: DownloadOptions = {}): Promise<Response> {
  const day = options.day ?? sheetDay(dateFormat);
  const { locale } = dateFormat;
  const key = sheetCacheKey({ request: sheet, day, locale, ...(options.record ? { record: options.record } : {}) });
  let entry;
  try {
    entry = await cachedSheet(key, () => drawSheet(sheet, day, locale));
  } catch (error) {
    const busy = pdfPoolBusyResponse(error);
    if (busy) return busy;
    throw error;
  }
  const validators = { ETag: entry.etag, 'Cache-Control': CACHE_CONTROL };
  if (matchesIfNoneMatch(options.request?.headers.get('if-none-match') ?? null, entry.etag))
    return new Response(null, { status: 304, headers: validators });
  return new Response(servedBytes(entry.body), {
    status: 200,
    headers: {
      ...validators,
      // A multi-page sheet as SVG is a ZIP of its pages (svgFile).
      ...(sheet.format === 'svg' && isZip(entry.body)
        ? { 'Content-Type': 'application/zip', 'Content-Disposition': `attachment; filename="${sheetFileName(sheet).replace(/\.svg$/, '.zip')}"` }
        : { 'Content-Type': CONTENT_TYPE[sheet.format], 'Content-Disposition': `attachment; filename="${sheetFileName(sheet)}"` }),
      'X-Content-Type-Options': 'nosniff',
      // What the layout could not draw as asked, and why (also printed on the sheet): percent-encoded JSON list.
      'X-Sheet-Layout-Notes': encodeURIComponent(JSON.stringify(entry.notes)),
    },
  });
}

/**
 * The cached bytes as a body, without a copy per answer: a typed array given to Response is copied
 * first (the Fetch body is a byte stream, and a byte stream takes over the buffers it is given), which
 * under repeated downloads was one 45 kB buffer per answer for the garbage collector. A default stream
 * hands its chunk on as it is; node writes it to the socket and leaves it untouched.
 */
function servedBytes(body: Uint8Array): ReadableStream<Uint8Array> {
  return new ReadableStream<Uint8Array>({
    start(controller) {
      controller.enqueue(body);
      controller.close();
    },
  });
}

/**
 * One plain SVG for a one-page sheet; for a multi-page sheet a ZIP of one true-size SVG per page
 * (page-01.svg, page-02.svg, …), so no page is lost in one unpaged canvas.
 */
function svgFile(drawing: Drawing): string | Uint8Array {
  if (drawing.pages.length === 1) return renderSvg(drawing);
  const digits = Math.max(2, String(drawing.pages.length).length);
  const files: Record<string, Uint8Array> = {};
  drawing.pages.forEach((_, i) => (files[`page-${String(i + 1).padStart(digits, '0')}.svg`] = strToU8(renderSvgPage(drawing, i))));
  return zipSync(files, { level: 6 });
}

/** A ZIP starts with its local file header signature "PK\x03\x04" (PKWARE APPNOTE.TXT §4.3.7). */
function isZip(body: Uint8Array): boolean {
  return body[0] === 0x50 && body[1] === 0x4b && body[2] === 0x03 && body[3] === 0x04;
}
