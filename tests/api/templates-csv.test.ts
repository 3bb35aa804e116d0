import { beforeEach, describe, expect, it, vi } from 'vitest';
import Papa from 'papaparse';
import { CSV_COLUMNS } from '@/lib/templates/csv-columns';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { api, SAMPLE } from './templates-support';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest({ actingAs: 'technician' });
let ws: string;
beforeEach(() => {
  ws = world.shop.slug;
});

const HEADER = CSV_COLUMNS.join(',');
const GOOD_ROW = 'Kart reed 100,Invented reed-valve kart,50,50.6,100,cw,118,110,,18,18,17;18;19,exhaust:88/272;transfer:116/244,,false';

async function templateCount(): Promise<number> {
  const counted = await world.knex('templates').count({ n: "*" });
    const n = counted[0]?.n;
  return Number(n);
}

describe('CSV import', () => {
  it('imports valid rows in one go and stores every column', async () => {
    const response = await api.importCsv(ws, `${HEADER}\n${GOOD_ROW}\n`);
    expect(response.status).toBe(201);
    expect(await response.json()).toEqual({ imported: 1 });
    const { items } = await (await api.list(ws)).json();
    expect(items[0]).toMatchObject({
      name: 'Kart reed 100',
      boreMm: 50,
      strokeMm: 50.6,
      rodMm: 100,
      rotation: 'cw',
      rimDiameterMm: 118,
      faceDiameterMm: 110,
      flangeDiameterMm: null,
      hubHoleMm: 18,
      staticAdvanceDeg: 18,
      advanceMarksDeg: [17, 18, 19],
      portTargets: [
        { name: 'exhaust', opensCrankDeg: 88, closesCrankDeg: 272 },
        { name: 'transfer', opensCrankDeg: 116, closesCrankDeg: 244 },
      ],
      archived: false,
      version: 1,
    });
    const { revisions } = await (await api.revisions(ws, items[0].id)).json();
    expect(revisions).toMatchObject([{ version: 1, action: 'import', user: { name: 'World technician' } }]);
  });

  it('writes nothing when one row is bad, and names that row, its column and the rule', async () => {
    const rows = [GOOD_ROW, GOOD_ROW.replace('Kart reed 100,', 'Second,'), GOOD_ROW.replace(',50,50.6,', ',abc,50.6,'), GOOD_ROW];
    const response = await api.importCsv(ws, [HEADER, ...rows].join('\n'));
    expect(response.status).toBe(400);
    const body = await response.json();
    expect(body.error).toMatch(/nothing was imported/);
    // Header is spreadsheet row 1, so the third data row is row 4.
    expect(body.problems).toEqual([{ row: 4, column: 'bore_mm', message: 'bore_mm must be a number with "." as decimal point; got "abc"' }]);
    expect(body.issues[0].path).toBe('row 4.bore_mm');
    expect(await templateCount()).toBe(0);
  });

  it('reports every problem of every row, including range rules and unknown columns', async () => {
    const csv = ['name,bore_mm,rotation,advance_marks_deg_btdc', ',40,cw,16', 'Too big,400,cw,16', 'Bad turn,40,left,16;x'].join('\n');
    const body = await (await api.importCsv(ws, csv)).json();
    expect(body.problems).toEqual([
      { row: 2, column: 'name', message: expect.stringMatching(/^Name must not be empty/) },
      { row: 3, column: 'bore_mm', message: expect.stringMatching(/at most 150 mm/) },
      { row: 4, column: 'advance_marks_deg_btdc', message: expect.stringMatching(/separated by ";"/) },
      { row: 4, column: 'rotation', message: 'Rotation must be one of: cw, ccw' },
    ]);
    const unknown = await (await api.importCsv(ws, 'name,colour\nA,red')).json();
    expect(unknown.problems[0]).toMatchObject({ row: 1, column: 'colour' });
    expect(await templateCount()).toBe(0);
  });

  it('accepts a multipart upload of the file too', async () => {
    const response = await api.importForm(ws, `${HEADER}\n${GOOD_ROW}`);
    expect(response.status).toBe(201);
    expect(await templateCount()).toBe(1);
  });

  it('imports 10,000 rows (batched, one transaction)', async () => {
    const rows = Array.from({ length: 10_000 }, (_, i) => GOOD_ROW.replace('Kart reed 100', `Bulk ${String(i).padStart(5, '0')}`));
    const started = performance.now();
    const response = await api.importCsv(ws, [HEADER, ...rows].join('\r\n'));
    const elapsedMs = performance.now() - started;
    expect(response.status).toBe(201);
    expect(await response.json()).toEqual({ imported: 10_000 });
    expect(await templateCount()).toBe(10_000);
    const counted = await world.knex('template_revisions').count({ n: "*" });
    const n = counted[0]?.n;
    expect(Number(n)).toBe(10_000);
    // The list still pages in SQL: page 400 of 25 is the last.
    const last = await (await api.list(ws, '?sort=name&page=400&pageSize=25')).json();
    expect(last.total).toBe(10_000);
    expect(last.items.at(-1).name).toBe('Bulk 09999');
    console.info(`10,000-row CSV import: ${elapsedMs.toFixed(0)} ms`);
  });
});

describe('CSV export', () => {
  it('writes the documented header and round-trips: export → import gives the same templates', async () => {
    const tricky = {
      ...SAMPLE,
      name: 'Quoted, "odd" name',
      notes: 'Line one\nline two, with comma',
      description: '=SUM(A1) looks like a formula',
    };
    for (const body of [SAMPLE, tricky, { name: 'Bare minimum' }, { ...SAMPLE, name: 'Gone', archived: true }])
      expect((await api.create(ws, body)).status).toBe(201);

    const exported = await api.exportCsv(ws);
    expect(exported.headers.get('content-type')).toMatch(/^text\/csv/);
    const csv = await exported.text();
    // Read back with papaparse as an independent check of the file's shape (RFC 4180 quoting).
    const parsed = Papa.parse<Record<string, string>>(csv, { header: true });
    expect(parsed.meta.fields).toEqual([...CSV_COLUMNS]);
    expect(parsed.data.find((r) => r.name === tricky.name)?.description).toBe("'=SUM(A1) looks like a formula");

    const before = (await (await api.list(ws, '?archived=all&sort=name')).json()).items;
    await world.knex('templates').del();
    expect((await api.importCsv(ws, csv)).status).toBe(201);
    const after = (await (await api.list(ws, '?archived=all&sort=name')).json()).items;
    const fieldsOnly = (t: Record<string, unknown>) => {
      const { id: _i, createdAt: _c, updatedAt: _u, version: _v, createdBy: _cb, updatedBy: _ub, ...fields } = t;
      return fields;
    };
    expect(after.map(fieldsOnly)).toEqual(before.map(fieldsOnly));
    expect(after).toHaveLength(4);
  });
});
