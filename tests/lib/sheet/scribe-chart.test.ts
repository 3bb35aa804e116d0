// Source under test: lib/sheet/scribe-chart.ts (scribeRows, the table) via lib/sheet/build-drawing.ts.
// Expected values are hand-computed: arc = π·D·θ/360, chord = D·sin(θ/2).
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { scribeAnglesDeg, scribeRows } from '@/lib/sheet/scribe-chart';
import { FIXED_DATE, parseSvg, req } from './svg-measure';

describe('scribe chart', () => {
  it('matches hand-computed arcs and chords', () => {
    const rows = scribeRows(120, 18, 40, 22);
    // D = 120 mm, θ = 18°: arc = π·120·18/360 = 6π = 18.84956 mm; chord = 120·sin 9° = 120 × 0.1564345 = 18.77214 mm.
    expect(rows[0]!.angleDeg).toBe(18);
    expect(rows[0]!.arcMm).toBeCloseTo(18.84956, 5);
    expect(rows[0]!.chordMm).toBeCloseTo(18.77214, 5);
    // θ = 40°: arc = π·120·40/360 = 41.88790 mm; chord = 120·sin 20° = 120 × 0.3420201 = 41.04242 mm.
    expect(rows[1]!.arcMm).toBeCloseTo(41.8879, 4);
    expect(rows[1]!.chordMm).toBeCloseTo(41.04242, 5);
    // D = 100 mm, θ = 90°: arc = 25π = 78.53982 mm; chord = 100·sin 45° = 70.71068 mm.
    const [quarter] = scribeRows(100, 90, 90, 1);
    expect(quarter!.arcMm).toBeCloseTo(78.53982, 5);
    expect(quarter!.chordMm).toBeCloseTo(70.71068, 5);
  });

  it('steps by index (0.1° steps land on tenths, not on accumulated float error)', () => {
    const angles = scribeAnglesDeg(0, 40, 0.1);
    expect(angles).toHaveLength(401);
    expect(angles[3]).toBeCloseTo(0.3, 12);
    expect(angles.at(-1)).toBeCloseTo(40, 12);
  });

  it('prints the table to 0.01 mm as text in a ruled table', () => {
    const drawing = buildDrawing(req({ kind: 'scribe', diameterMm: 120, fromDeg: 0, toDeg: 40, stepDeg: 1 }), { date: FIXED_DATE });
    const svg = parseSvg(renderSvg(drawing));
    const cells = (role: string) => svg.all('text').filter((t) => t.getAttribute('data-role') === role).map((t) => t.textContent);
    expect(cells('scribe-angle')).toHaveLength(41);
    const at18 = cells('scribe-angle').indexOf('18');
    expect(cells('scribe-arc')[at18]).toBe('18.85');
    expect(cells('scribe-chord')[at18]).toBe('18.77');
    expect(cells('scribe-arc')[40]).toBe('41.89');
    expect(cells('scribe-chord')[40]).toBe('41.04');
    expect(svg.all('rect').some((r) => r.getAttribute('data-role') === 'scribe-table')).toBe(true);
  });

  it('flows a 400-row chart (the most allowed) over several pages, every row once', () => {
    const drawing = buildDrawing(req({ kind: 'scribe', diameterMm: 80, fromDeg: 0, toDeg: 39.9, stepDeg: 0.1 }), { date: FIXED_DATE });
    expect(drawing.pages.length).toBeGreaterThan(3);
    const svg = parseSvg(renderSvg(drawing));
    const angles = svg.all('text').filter((t) => t.getAttribute('data-role') === 'scribe-angle').map((t) => t.textContent);
    expect(angles).toHaveLength(400);
    expect(new Set(angles).size).toBe(400);
    expect(angles[0]).toBe('0.0');
    expect(angles.at(-1)).toBe('39.9');
  });
});

describe('a scribe chart longer than its first page', () => {
  it('repeats its column header on every page that holds rows (41 rows, 0–40° every 1°)', () => {
    const drawing = buildDrawing(req({ kind: 'scribe', diameterMm: 120, fromDeg: 0, toDeg: 40, stepDeg: 1 }), { date: FIXED_DATE });
    const onPage = (y: number) => drawing.pages.findIndex((p) => y >= p.viewportMm.yMm && y < p.viewportMm.yMm + p.viewportMm.heightMm);
    const texts = drawing.shapes.filter((s) => s.type === 'text');
    const rowPages = new Set(texts.filter((t) => t.data?.role === 'scribe-angle').map((t) => onPage(t.yMm)));
    const headerPages = new Set(texts.filter((t) => t.data?.role === 'scribe-header').map((t) => onPage(t.yMm)));
    expect(texts.filter((t) => t.data?.role === 'scribe-angle')).toHaveLength(41);
    for (const page of rowPages) expect(headerPages.has(page)).toBe(true);
  });
});
