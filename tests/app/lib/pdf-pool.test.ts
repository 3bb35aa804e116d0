import { afterAll, describe, expect, it, vi } from 'vitest';
import { DEFAULT_DATE_FORMAT } from '@/lib/format/date-format';
import { sheetRequestSchema, type SheetRequestInput } from '@/lib/sheet/sheet-request';
import { renderPdfJob, type PdfJob } from '@/pdf/pdf-job';
import { readPdfText } from '../../pdf/read-pdf-text';

// One worker and one waiting place, so a burst overflows the queue at once.
vi.stubEnv('RIMSCALE_PDF_THREADS', '1');
vi.stubEnv('RIMSCALE_PDF_QUEUE', '1');
const { closePdfPool, PdfPoolBusy, renderPdf } = await import('@/app/lib/pdf-pool');
const { sheetDownloadResponse } = await import('@/app/lib/sheet-response');

afterAll(() => closePdfPool());

const job = (input: SheetRequestInput, day = '2026-03-14'): PdfJob => ({ kind: 'sheet', props: { request: sheetRequestSchema.parse(input), day, locale: 'en-GB' } });

describe('the PDF worker pool', () => {
  it('renders in a worker thread what this thread renders, and the title block carries the job’s day', async () => {
    const sheet = job({ kind: 'wheel', diameterMm: 128.4, title: 'Pool check' });
    const pooled = await renderPdf(sheet);
    const direct = await renderPdfJob(sheet);
    expect(Buffer.from(pooled.bytes).equals(Buffer.from(direct.bytes))).toBe(true);
    expect(pooled.notes).toEqual(direct.notes);
    // pdf-parse, an independent reader, finds the date the job named, as en-GB writes it (lib/format/date-format.ts).
    const { text } = await readPdfText(Buffer.from(pooled.bytes));
    expect(text).toContain('14 Mar 2026');
  });

  it('refuses work beyond the bounded queue with PdfPoolBusy and a Retry-After of at least a second', async () => {
    const burst = Array.from({ length: 6 }, (_, i) => renderPdf(job({ kind: 'wheel', diameterMm: 100 + i })).then(() => 'done', (error: unknown) => error));
    const outcomes = await Promise.all(burst);
    const busy = outcomes.filter((o) => o instanceof PdfPoolBusy);
    expect(busy.length).toBeGreaterThan(0);
    expect(outcomes.filter((o) => o === 'done').length).toBeGreaterThanOrEqual(2); // the running job and the queued one
    for (const error of busy) expect(error.retryAfterS).toBeGreaterThanOrEqual(1);
  });

  it('answers a full queue with 503, Retry-After and the API error shape (RFC 9110 §15.6.4, §10.2.3)', async () => {
    const responses = await Promise.all(
      Array.from({ length: 6 }, (_, i) => sheetDownloadResponse(sheetRequestSchema.parse({ kind: 'wheel', diameterMm: 110 + i }), DEFAULT_DATE_FORMAT)),
    );
    const refused = responses.filter((r) => r.status === 503);
    expect(refused.length).toBeGreaterThan(0);
    for (const response of refused) {
      expect(Number(response.headers.get('retry-after'))).toBeGreaterThanOrEqual(1);
      expect(await response.json()).toEqual({ error: expect.stringMatching(/busy/), issues: [] });
    }
    expect(responses.filter((r) => r.status === 200).every((r) => r.headers.get('content-type') === 'application/pdf')).toBe(true);
  });
});
