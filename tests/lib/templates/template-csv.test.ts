import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { CSV_COLUMNS, CSV_COLUMN_SPECS } from '@/lib/templates/csv-columns';
import { readNumberCell, readPortsCell } from '@/lib/templates/csv-cells';
import { parseTemplatesCsv, templatesToCsv } from '@/lib/templates/template-csv';
import { EMPTY_TEMPLATE, templateSchema, type TemplateFields } from '@/lib/templates/template-schema';

describe('CSV column set', () => {
  it('is the documented list with units in the headers, each mapped to one template field', () => {
    expect(CSV_COLUMNS.join(',')).toBe(
      'name,description,bore_mm,stroke_mm,rod_mm,rotation,rim_diameter_mm,face_diameter_mm,flange_diameter_mm,hub_hole_mm,static_advance_deg_btdc,advance_marks_deg_btdc,port_targets,notes,archived',
    );
    expect(CSV_COLUMN_SPECS.map((s) => s.column)).toEqual([...CSV_COLUMNS]);
    expect(new Set(CSV_COLUMN_SPECS.map((s) => s.field)).size).toBe(CSV_COLUMNS.length);
  });
});

describe('CSV cells', () => {
  it('reads numbers strictly with "." as decimal point; empty is unknown', () => {
    expect(readNumberCell(' 54.5 ', 'bore_mm')).toEqual({ ok: true, value: 54.5 });
    expect(readNumberCell('', 'bore_mm')).toEqual({ ok: true, value: null });
    expect(readNumberCell('54,5', 'bore_mm')).toMatchObject({ ok: false, message: expect.stringMatching(/bore_mm must be a number/) });
    expect(readNumberCell('0x10', 'bore_mm').ok).toBe(false);
  });

  it('reads port targets as name:opens/closes;…', () => {
    expect(readPortsCell('exhaust:92/268; inlet port:300/60', 'port_targets')).toEqual({
      ok: true,
      value: [
        { name: 'exhaust', opensCrankDeg: 92, closesCrankDeg: 268 },
        { name: 'inlet port', opensCrankDeg: 300, closesCrankDeg: 60 },
      ],
    });
    expect(readPortsCell('exhaust 92-268', 'port_targets').ok).toBe(false);
  });
});

describe('parseTemplatesCsv', () => {
  it('accepts columns in any order, a BOM, and header case and spaces', () => {
    const result = parseTemplatesCsv('\uFEFF Bore_MM ,NAME\n45,Shop single');
    expect(result).toMatchObject({ ok: true, templates: [{ ...EMPTY_TEMPLATE, name: 'Shop single', boreMm: 45 }], delimiter: ',' });
  });

  it('reports a row with too many cells by its spreadsheet row', () => {
    const result = parseTemplatesCsv('name,bore_mm\nA,40\nB,40,extra');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems[0]).toMatchObject({ row: 3, column: '(row)' });
  });

  it('refuses a file without rows or without a name column', () => {
    expect(parseTemplatesCsv('name,bore_mm\n')).toMatchObject({ ok: false, problems: [{ message: 'The file has no template rows' }] });
    expect(parseTemplatesCsv('bore_mm\n40')).toMatchObject({ ok: false, problems: [{ row: 1, column: 'name' }] });
  });

  it('names the CSV column for a cross-field rule', () => {
    const result = parseTemplatesCsv('name,face_diameter_mm,hub_hole_mm\nA,100,120');
    expect(result).toMatchObject({ ok: false, problems: [{ row: 2, column: 'hub_hole_mm', message: expect.stringMatching(/smaller than/) }] });
  });
});

// Any valid template survives export then import unchanged (property test, fast-check).
const text = (max: number) => fc.string({ maxLength: max }).map((s) => s.trim());
const mm = (min: number, max: number) => fc.option(fc.double({ min, max, noNaN: true }), { nil: null });
const templateArb: fc.Arbitrary<TemplateFields> = fc
  .record({
    name: text(80).filter((s) => s.length > 0),
    description: text(200),
    boreMm: mm(10, 150),
    strokeMm: mm(10, 150),
    rodMm: mm(20, 400),
    rotation: fc.constantFrom('cw' as const, 'ccw' as const),
    rimDiameterMm: mm(20, 300),
    faceDiameterMm: mm(20, 600),
    flangeDiameterMm: fc.option(fc.double({ min: 302, max: 600, noNaN: true }), { nil: null }),
    hubHoleMm: fc.option(fc.double({ min: 0, max: 19, noNaN: true }), { nil: null }),
    staticAdvanceDeg: mm(0, 60),
    advanceMarksDeg: fc.array(fc.double({ min: 0, max: 60, noNaN: true }), { maxLength: 5 }),
    portTargets: fc.array(
      fc.record({
        name: fc.string({ minLength: 1, maxLength: 24 }).map((s) => s.trim()).filter((s) => s.length > 0 && !/[;:/]/.test(s)),
        opensCrankDeg: fc.double({ min: 0, max: 360, noNaN: true }),
        closesCrankDeg: fc.double({ min: 0, max: 360, noNaN: true }),
      }),
      { maxLength: 4 },
    ),
    notes: text(300),
    archived: fc.boolean(),
  })
  .filter((t) => templateSchema.safeParse(t).success)
  .map((t) => templateSchema.parse(t));

describe('templatesToCsv → parseTemplatesCsv', () => {
  it('round-trips any valid templates exactly', () => {
    fc.assert(
      fc.property(fc.array(templateArb, { minLength: 1, maxLength: 5 }), (templates) => {
        const csv = templatesToCsv(templates);
        expect(parseTemplatesCsv(csv)).toMatchObject({ ok: true, templates, fields: CSV_COLUMN_SPECS.map((s) => s.field) });
        // papaparse, read independently, sees one record per template and the documented header.
        const parsed = Papa.parse(csv, { header: true, skipEmptyLines: 'greedy' });
        expect(parsed.data).toHaveLength(templates.length);
      }),
      { numRuns: 150 },
    );
  });
});
