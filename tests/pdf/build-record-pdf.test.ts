import { describe, expect, it } from 'vitest';
import { CAUTIONS } from '@/lib/builds/customer-copy';
import { renderBuildRecordPdf } from '@/pdf/render-build-record-pdf';
import { sampleBuild } from '@/tests/support/sample-build';
import { MM_PER_PT, readPdfTextItems } from './read-pdf-geometry';
import { readPdfText } from './read-pdf-text';

/**
 * The customer's copy read back with independent readers: pdf-parse for text and page
 * size, pdfjs-dist's operator list for where the text sits.
 */

const flat = (text: string) => text.replace(/\s+/g, ' ');

describe('customer’s copy PDF', () => {
  it('is one A4 page titled with the shop, holding the customer, TDC, timing, every port with its deviation and the cautions', async () => {
    const pdf = await renderBuildRecordPdf(sampleBuild(), 'Kestrel Lane Motors');
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const { text, pageCount, pages, info } = await readPdfText(pdf);
    expect(pageCount).toBe(1);
    // ISO 216 A4 is 210 × 297 mm; ISO 32000 user space is 1/72 in, so 595.28 × 841.89 pt.
    expect(pages[0]!.widthPt).toBeCloseTo(595.28, 1);
    expect(pages[0]!.heightPt).toBeCloseTo(841.89, 1);
    expect(info.Title).toBe('Kestrel Lane Motors — Engine timing record');
    const t = flat(text);
    expect(t).toContain('Kestrel Lane Motors');
    expect(t).toContain('Avery Quillfeather');
    expect(t).toContain('QX-0042');
    expect(t).toContain('Rowan Tinsley');
    // TDC midway between 340° and 24° is 2° (common practice): corrected by −2.0°.
    expect(t).toContain('2.0° on the wheel');
    expect(t).toContain('−2.0°');
    // 18° BTDC is 1.218 mm of piston travel with a 40 mm stroke and 80 mm rod (Heywood eq. 2.5).
    expect(t).toContain('18.0° BTDC = 1.22 mm BTDC');
    expect(t).toContain('with a strobe at 3000 rpm');
    // Durations 211.1° and 140.5° against 210° and 132° (eq. 2.5 inverse, worked in tests/lib/builds).
    expect(t).toMatch(/Exhaust 17\.50 mm 74\.5° ATDC 285\.5° ATDC 211\.1° 210\.0° \+1\.1° within/);
    expect(t).toMatch(/Transfer 29\.50 mm 109\.7° ATDC 250\.3° ATDC 140\.5° 132\.0° \+8\.5° OUTSIDE/);
    expect(t).toContain('Blowdown (exhaust opens before the transfers): 35.3°');
    expect(t).toContain('Fitted a new stop-switch wire.');
    for (const caution of CAUTIONS) expect(t).toContain(caution);
    expect(t).toContain('The engine maker’s manual and local regulations come first.');
    // A document, not a web page: no navigation or form words.
    expect(t).not.toMatch(/Sign in|Save|Submit|Menu/);
  });

  it('prints on US Letter when asked (ANSI/ASME Y14.1: 8.5 × 11 in = 612 × 792 pt)', async () => {
    const { pages, pageCount } = await readPdfText(await renderBuildRecordPdf(sampleBuild(), 'Kestrel Lane Motors', 'Letter'));
    expect(pageCount).toBe(1);
    expect(pages[0]).toEqual({ widthPt: 612, heightPt: 792 });
  });

  it('stays one page with everything full, the last caution inside the page margin', async () => {
    const full = sampleBuild({
      ports: Array.from({ length: 12 }, (_, i) => ({ name: `Port ${i + 1}`, heightMm: 15 + i })),
      otherMeasurements: Array.from({ length: 20 }, (_, i) => ({ name: `Measurement ${i + 1}`, value: '12.5', unit: 'mm' })),
      notes: 'Long notes. '.repeat(400),
    });
    for (const paper of ['A4', 'Letter'] as const) {
      const pdf = await renderBuildRecordPdf(full, 'Kestrel Lane Motors', paper);
      const { pageCount, pages, text } = await readPdfText(pdf);
      expect(pageCount).toBe(1);
      expect(flat(text)).toContain('the full notes are kept in the shop’s record');
      const items = await readPdfTextItems(pdf);
      const last = items.find((item) => item.text.includes('local regulations come first'));
      expect(last).toBeDefined();
      // yMm is measured down from the top of the page; the copy keeps 14 mm clear at the foot (footer line there).
      expect(last!.yMm).toBeLessThan(pages[0]!.heightPt * MM_PER_PT - 14);
    }
  });
});
