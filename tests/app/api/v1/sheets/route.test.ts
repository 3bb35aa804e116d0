import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/sheets/route';
import { MAX_JSON_BODY_BYTES } from '@/app/lib/api';
import { parseSvg } from '@/tests/lib/sheet/svg-measure';
import { readPdfText } from '@/tests/pdf/read-pdf-text';

/** POST /api/v1/sheets called directly with a Request, no server. */

function post(body: unknown, options: { raw?: boolean } = {}): Promise<Response> {
  return POST(
    new Request('http://localhost/api/v1/sheets', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: options.raw ? (body as string) : JSON.stringify(body),
    }),
  );
}

type ErrorBody = { error: string; issues: Array<{ path: string; message: string }> };

async function refusal(body: unknown, options: { raw?: boolean } = {}) {
  const response = await post(body, options);
  const json = (await response.json()) as ErrorBody;
  return { status: response.status, json, type: response.headers.get('content-type') };
}

describe('POST /api/v1/sheets refuses bad requests by field, with the allowed range', () => {
  // The ranges are issue 3's: diameters 20–600 mm, advance marks 0–60° BTDC and at most 72 of them.
  it.each([
    ['diameter 10 mm', { kind: 'wheel', diameterMm: 10 }, 'diameterMm', /20–600 mm/],
    ['diameter 700 mm', { kind: 'wheel', diameterMm: 700 }, 'diameterMm', /20–600 mm/],
    ['diameter "abc"', { kind: 'wheel', diameterMm: 'abc' }, 'diameterMm', /number, 20–600 mm/],
    ['no diameter for a wheel', { kind: 'wheel' }, 'diameterMm', /required.*20–600 mm/],
    ['hub hole as large as the disc', { kind: 'wheel', diameterMm: 100, hubHoleMm: 100 }, 'hubHoleMm', /smaller than the disc diameter.*100 mm/],
    ['ring inner ≥ outer', { kind: 'ring', innerDiameterMm: 160, outerDiameterMm: 150 }, 'innerDiameterMm', /smaller than the outer diameter \(150 mm\)/],
    ['advance mark 61° BTDC', { kind: 'wheel', diameterMm: 100, advanceMarksDeg: [18, 61] }, 'advanceMarksDeg.1', /0–60° BTDC/],
    ['advance mark −1° BTDC', { kind: 'wheel', diameterMm: 100, advanceMarksDeg: [-1] }, 'advanceMarksDeg.0', /0–60° BTDC/],
    ['73 advance marks', { kind: 'wheel', diameterMm: 100, advanceMarksDeg: Array.from({ length: 73 }, (_, i) => (i % 60) + 0.5) }, 'advanceMarksDeg', /at most 72/],
    ['an unknown kind', { kind: 'hexagon', diameterMm: 100 }, 'kind', /wheel, ring, strip, scribe, check/],
    ['an unknown format', { kind: 'wheel', diameterMm: 100, format: 'png' }, 'format', /svg, pdf/],
    ['target advance 75° BTDC', { kind: 'wheel', diameterMm: 100, strobeReadable: true, targetAdvanceDeg: 75 }, 'targetAdvanceDeg', /^Target advance .*0–60° BTDC/],
    ['strobe-readable "yes"', { kind: 'wheel', diameterMm: 100, strobeReadable: 'yes' }, 'strobeReadable', /^Strobe-readable must be true or false/],
  ])('%s → 400 naming %s', async (_, body, path, message) => {
    const { status, json, type } = await refusal(body);
    expect(status).toBe(400);
    expect(type).toMatch(/application\/json/);
    expect(json.error).toEqual(expect.any(String));
    const issue = json.issues.find((i) => i.path === path);
    expect(issue, `an issue for ${path} in ${JSON.stringify(json.issues)}`).toBeDefined();
    expect(issue!.message).toMatch(message);
  });

  it('invalid JSON → 400 with a body issue', async () => {
    const { status, json } = await refusal('{"kind": "wheel", diameterMm: 100', { raw: true });
    expect(status).toBe(400);
    expect(json.error).toMatch(/not valid JSON/);
    expect(json.issues[0]!.path).toBe('(body)');
  });

  it('a body over the size cap → 413 in the same error shape', async () => {
    const padding = 'x'.repeat(MAX_JSON_BODY_BYTES + 1);
    const { status, json } = await refusal(JSON.stringify({ kind: 'wheel', diameterMm: 100, title: padding }), { raw: true });
    expect(status).toBe(413);
    expect(json.error).toMatch(/larger than 64 KiB/);
    expect(json.issues[0]!.path).toBe('(body)');
  });

  it('never answers 500 on arbitrary JSON, and a 200 SVG never holds NaN or Infinity (fast-check)', async () => {
    const plausible = fc.record(
      {
        kind: fc.constantFrom('wheel', 'ring', 'strip', 'scribe', 'check', 'other'),
        diameterMm: fc.oneof(fc.double({ min: -10, max: 800, noNaN: true }), fc.string()),
        hubHoleMm: fc.double({ min: -5, max: 700, noNaN: true }),
        innerDiameterMm: fc.double({ min: 0, max: 700, noNaN: true }),
        outerDiameterMm: fc.double({ min: 0, max: 700, noNaN: true }),
        advanceMarksDeg: fc.array(fc.double({ min: -5, max: 70, noNaN: true }), { maxLength: 8 }),
        printerScaleX: fc.double({ min: 0.8, max: 1.2, noNaN: true }),
        title: fc.string({ maxLength: 90 }),
        format: fc.constant('svg'),
      },
      { requiredKeys: ['kind', 'format'] },
    );
    await fc.assert(
      fc.asyncProperty(fc.oneof(plausible, fc.jsonValue()), async (body) => {
        const response = await post(body);
        expect([200, 400]).toContain(response.status);
        if (response.status === 200) {
          const svg = await response.text();
          expect(svg.startsWith('<svg')).toBe(true);
          expect(svg).not.toMatch(/NaN|Infinity/);
        }
      }),
      { numRuns: 60 },
    );
  });
});

/**
 * Requests inside every allowed range, written out from the sheet request schema (lib/sheet/sheet-request.ts):
 * diameters 20–600 mm, hub hole under the disc, ring inner under outer, strip width 6–40 mm, paper 0–0.5 mm,
 * advance marks 0–60° BTDC, scribe chart 0–180° in steps of 0.1–10°, printer scale 0.9–1.1.
 */
const mm = (min: number, max: number) => fc.double({ min, max, noNaN: true });
const common = {
  rotation: fc.constantFrom('cw', 'ccw'),
  carrier: fc.constantFrom('rotating', 'stationary'),
  numbering: fc.constantFrom('split', 'full'),
  paper: fc.constantFrom('A4', 'A3', 'Letter', 'Legal', 'Tabloid'),
  orientation: fc.constantFrom('portrait', 'landscape'),
  printerScaleX: mm(0.9, 1.1),
  printerScaleY: mm(0.9, 1.1),
  advanceMarksDeg: fc.array(mm(0, 60), { maxLength: 8 }),
  title: fc.string({ maxLength: 80 }),
};
const validRequest = fc.oneof(
  fc.record({ kind: fc.constant('wheel'), diameterMm: mm(20, 600), ...common }).chain((wheel) =>
    mm(0, wheel.diameterMm * 0.9).map((hubHoleMm) => ({ ...wheel, hubHoleMm })),
  ),
  fc.record({ kind: fc.constant('ring'), innerDiameterMm: mm(20, 590), ...common }).chain((ring) =>
    mm(ring.innerDiameterMm + 1, 600).map((outerDiameterMm) => ({ ...ring, outerDiameterMm })),
  ),
  fc.record({ kind: fc.constant('strip'), diameterMm: mm(20, 600), stripWidthMm: mm(6, 40), paperThicknessMm: mm(0, 0.5), ...common }),
  fc.record({ kind: fc.constant('scribe'), diameterMm: mm(20, 600), fromDeg: mm(0, 90), stepDeg: mm(1, 10), ...common }).chain((chart) =>
    mm(chart.fromDeg, 180).map((toDeg) => ({ ...chart, toDeg })),
  ),
  fc.record({ kind: fc.constant('check'), ...common }),
);

describe('POST /api/v1/sheets draws every valid request (fast-check)', () => {
  it('answers 200 with a true-scale SVG for any request inside the allowed ranges', async () => {
    await fc.assert(
      fc.asyncProperty(validRequest, async (body) => {
        const response = await post({ ...body, format: 'svg' });
        expect(response.status).toBe(200);
        // A multi-page sheet comes as a ZIP of page SVGs (checked on its own below); the rest as one SVG.
        if (response.headers.get('content-type') === 'application/zip') return;
        const text = await response.text();
        expect(response.headers.get('content-type')).toMatch(/^image\/svg\+xml/);
        expect(text).toMatch(/^<svg[^>]* width="[\d.]+mm" height="[\d.]+mm"/); // CSS absolute length unit mm
        expect(text).not.toMatch(/NaN|Infinity/);
      }),
      { numRuns: 60 },
    );
  });

  it('answers 200 with a PDF for requests inside the allowed ranges', async () => {
    await fc.assert(
      fc.asyncProperty(validRequest, async (body) => {
        const response = await post({ ...body, format: 'pdf' });
        expect(response.status).toBe(200);
        expect(response.headers.get('content-type')).toBe('application/pdf');
        const bytes = new Uint8Array(await response.arrayBuffer());
        expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe('%PDF-'); // ISO 32000-1 §7.5.2 file header
      }),
      { numRuns: 8 },
    );
  });
});

describe('POST /api/v1/sheets answers sheets', () => {
  it('a PDF by default, as an attachment named after kind, diameter and title, revalidated before reuse', async () => {
    const response = await post({ kind: 'wheel', diameterMm: 100, advanceMarksDeg: [18], title: 'Büro Rad "7" <b>' });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/pdf');
    expect(response.headers.get('content-disposition')).toBe('attachment; filename="rimscale-wheel-100mm-buro-rad-7-b.pdf"');
    // RFC 9111 §5.2.2.4: a browser may keep it but asks again (a 304 while unchanged); no shared cache keeps it.
    expect(response.headers.get('cache-control')).toBe('private, no-cache');
    expect(response.headers.get('etag')).toMatch(/^"[A-Za-z0-9_-]+"$/);
    const bytes = new Uint8Array(await response.arrayBuffer());
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe('%PDF-'); // ISO 32000-1 §7.5.2 file header
    const { text } = await readPdfText(bytes);
    expect(text).toContain('18° BTDC');
  });

  it('an SVG when asked, true-scale root and no NaN', async () => {
    const response = await post({ kind: 'ring', innerDiameterMm: 120, outerDiameterMm: 160, format: 'svg' });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toMatch(/^image\/svg\+xml/);
    expect(response.headers.get('content-disposition')).toBe('attachment; filename="rimscale-ring-160mm.svg"');
    const svg = await response.text();
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toMatch(/^<svg[^>]* width="[\d.]+mm" height="[\d.]+mm"/); // CSS absolute length unit mm
    expect(svg).not.toContain('NaN');
  });

  it('says in its answer what it could not draw and why (X-Sheet-Layout-Notes), and nothing when all is drawn', async () => {
    const response = await post({ kind: 'strip', diameterMm: 150, windowCrankDeg: [320, 10], advanceMarksDeg: [18, 55], format: 'svg' });
    expect(response.status).toBe(200);
    const notes = JSON.parse(decodeURIComponent(response.headers.get('x-sheet-layout-notes') ?? '')) as string[];
    expect(notes.find((note) => note.startsWith('Not drawn, outside the window'))).toContain('advance mark 55° BTDC');
    const plain = await post({ kind: 'wheel', diameterMm: 150, advanceMarksDeg: [18], portEvents: [{ name: 'EX', opensCrankDeg: 98, closesCrankDeg: 262 }], format: 'svg' });
    expect(JSON.parse(decodeURIComponent(plain.headers.get('x-sheet-layout-notes') ?? ''))).toEqual([]);
    // A strip too narrow for 5 mm strobe figures says so rather than drawing them smaller in silence.
    const narrow = await post({ kind: 'strip', diameterMm: 240, stripWidthMm: 12, strobeReadable: true, advanceBandDeg: [16, 22], format: 'svg' });
    const narrowNotes = JSON.parse(decodeURIComponent(narrow.headers.get('x-sheet-layout-notes') ?? '')) as string[];
    expect(narrowNotes.join('\n')).toMatch(/Strobe-readable figures drawn .* below the 5 mm asked for: the strip is only 12 mm wide/);
  });

  it('a multi-page sheet as SVG is a ZIP of one true-size SVG per page, each numbered (read by Info-ZIP unzip and @xmldom/xmldom)', async () => {
    const response = await post({ kind: 'wheel', diameterMm: 400, format: 'svg' });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/zip');
    expect(response.headers.get('content-disposition')).toBe('attachment; filename="rimscale-wheel-400mm.zip"');
    const dir = mkdtempSync(path.join(tmpdir(), 'rimscale-zip-'));
    try {
      writeFileSync(path.join(dir, 'sheet.zip'), new Uint8Array(await response.arrayBuffer()));
      execFileSync('unzip', ['-q', 'sheet.zip'], { cwd: dir });
      const pages = readdirSync(dir).filter((f) => f.endsWith('.svg')).sort();
      expect(pages.length).toBeGreaterThan(1);
      pages.forEach((file, i) => {
        expect(file).toBe(`page-${String(i + 1).padStart(2, '0')}.svg`);
        const svg = parseSvg(readFileSync(path.join(dir, file), 'utf8'));
        // ISO 216 A4 portrait, in CSS absolute millimetres.
        expect(svg.root.getAttribute('width')).toBe('210mm');
        expect(svg.root.getAttribute('height')).toBe('297mm');
        expect(svg.root.getAttribute('data-page')).toBe(String(i + 1));
        expect(svg.all('text').some((t) => (t.textContent ?? '').includes(`page ${i + 1} of ${pages.length}`))).toBe(true);
      });
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('a one-page sheet as SVG stays one plain SVG', async () => {
    const response = await post({ kind: 'wheel', diameterMm: 100, format: 'svg' });
    expect(response.headers.get('content-type')).toMatch(/^image\/svg\+xml/);
    expect((await response.text()).startsWith('<svg')).toBe(true);
  });

  it('a check sheet has no diameter in its file name', async () => {
    const response = await post({ kind: 'check', format: 'svg' });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-disposition')).toBe('attachment; filename="rimscale-check.svg"');
  });
});
