import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { closePdfPool } from '@/app/lib/pdf-pool';
import { clearSheetCache } from '@/app/lib/sheet-cache';
import { sheetDay, sheetDownloadResponse } from '@/app/lib/sheet-response';
import { DEFAULT_DATE_FORMAT } from '@/lib/format/date-format';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { sheetRequestSchema, type SheetRequestInput } from '@/lib/sheet/sheet-request';
import { dayFormat, dayStart } from '@/lib/sheet/sheet-day';
import { renderPdfJob } from '@/pdf/pdf-job';

afterAll(() => closePdfPool());
beforeEach(() => clearSheetCache());

const DAY = '2026-03-14';

/** What this thread draws for a request, with no pool and no cache: the reference bytes. */
async function directBytes(input: SheetRequestInput, day = DAY): Promise<Buffer> {
  const request = sheetRequestSchema.parse(input);
  const { locale } = DEFAULT_DATE_FORMAT;
  if (request.format === 'svg') return Buffer.from(renderSvg(buildDrawing(request, { date: dayStart(day), dateFormat: dayFormat(locale) })), 'utf8');
  return Buffer.from((await renderPdfJob({ kind: 'sheet', props: { request, day, locale } })).bytes);
}

function download(input: SheetRequestInput, headers: Record<string, string> = {}, day = DAY): Promise<Response> {
  const request = new Request('http://localhost/api/v1/sheets', { method: 'POST', headers });
  return sheetDownloadResponse(sheetRequestSchema.parse(input), DEFAULT_DATE_FORMAT, { request, day });
}

const bytesOf = async (response: Response) => Buffer.from(await response.arrayBuffer());

const REQUESTS: Array<[string, SheetRequestInput]> = [
  ['a one-page wheel PDF', { kind: 'wheel', diameterMm: 128.4, advanceMarksDeg: [16, 18], title: 'Bench wheel' }],
  ['a tiled 400 mm wheel PDF', { kind: 'wheel', diameterMm: 400, rotation: 'ccw' }],
  ['a flange ring PDF with a printer correction', { kind: 'ring', innerDiameterMm: 110, outerDiameterMm: 150, printerScaleX: 0.996, printerScaleY: 1.003, printerProfileName: 'Front desk laser' }],
  ['a rim strip PDF', { kind: 'strip', diameterMm: 180, numbering: 'full', portEvents: [{ name: 'exhaust', opensCrankDeg: 95, closesCrankDeg: 265 }] }],
  ['a scribe chart PDF', { kind: 'scribe', diameterMm: 120, fromDeg: 10, toDeg: 30 }],
  ['a wheel SVG', { kind: 'wheel', diameterMm: 96, format: 'svg' }],
];

describe('sheet downloads through the worker pool and the cache', () => {
  it.each(REQUESTS)('%s: the pooled answer, the cached repeat and a direct render are the same bytes', async (_name, input) => {
    const direct = await directBytes(input);
    const first = await download(input);
    const repeat = await download(input);
    expect(first.status).toBe(200);
    expect(repeat.status).toBe(200);
    expect((await bytesOf(first)).equals(direct)).toBe(true);
    expect((await bytesOf(repeat)).equals(direct)).toBe(true);
    // A strong validator (RFC 9110 §8.8.3): a quoted opaque tag, no W/ prefix, the same for the same bytes.
    expect(first.headers.get('etag')).toMatch(/^"[A-Za-z0-9_-]+"$/);
    expect(repeat.headers.get('etag')).toBe(first.headers.get('etag'));
    expect(first.headers.get('cache-control')).toBe('private, no-cache');
  });

  it('serves one cached copy many times and leaves it whole: answers read at once and one after another are the same bytes', async () => {
    const input: SheetRequestInput = { kind: 'wheel', diameterMm: 128.4 };
    const direct = await directBytes(input);
    const together = await Promise.all(Array.from({ length: 8 }, async () => bytesOf(await download(input))));
    const after: Buffer[] = [];
    for (let i = 0; i < 4; i += 1) after.push(await bytesOf(await download(input)));
    for (const body of [...together, ...after]) expect(body.equals(direct)).toBe(true);
  });

  it('answers If-None-Match with the current ETag as 304 Not Modified without a body (RFC 9110 §13.1.2, §15.4.5)', async () => {
    const input: SheetRequestInput = { kind: 'wheel', diameterMm: 128.4 };
    const etag = (await download(input)).headers.get('etag')!;
    const notModified = await download(input, { 'if-none-match': `"something-else", ${etag}` });
    expect(notModified.status).toBe(304);
    expect(notModified.headers.get('etag')).toBe(etag);
    expect((await bytesOf(notModified)).length).toBe(0);
    // A weak form of the same tag also matches: If-None-Match uses the weak comparison.
    expect((await download(input, { 'if-none-match': `W/${etag}` })).status).toBe(304);
    const stale = await download(input, { 'if-none-match': '"an-older-sheet"' });
    expect(stale.status).toBe(200);
    expect((await bytesOf(stale)).equals(await directBytes(input))).toBe(true);
  });

  it('draws a sheet of another day afresh: the date in the title block is part of what is cached', async () => {
    const input: SheetRequestInput = { kind: 'wheel', diameterMm: 100, format: 'svg' };
    const today = await bytesOf(await download(input, {}, '2026-03-14'));
    const tomorrow = await bytesOf(await download(input, {}, '2026-03-15'));
    // en-GB, the default date format (lib/format/date-format.ts), writes "14 Mar 2026".
    expect(today.toString('utf8')).toContain('14 Mar 2026');
    expect(tomorrow.toString('utf8')).toContain('15 Mar 2026');
    expect(tomorrow.equals(await directBytes(input, '2026-03-15'))).toBe(true);
  });
});

describe('sheetDay', () => {
  it('is the calendar day in the reader’s time zone (IANA tz: Berlin is UTC+1 in March, Los Angeles UTC−7 after 8 March 2026)', () => {
    const lateEvening = new Date('2026-03-14T23:30:00Z');
    expect(sheetDay({ locale: 'en-GB', timeZone: 'UTC' }, lateEvening)).toBe('2026-03-14');
    expect(sheetDay({ locale: 'en-GB', timeZone: 'Europe/Berlin' }, lateEvening)).toBe('2026-03-15');
    expect(sheetDay({ locale: 'en-GB', timeZone: 'America/Los_Angeles' }, new Date('2026-03-15T05:00:00Z'))).toBe('2026-03-14');
  });
});
