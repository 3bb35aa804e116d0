import { beforeEach, describe, expect, it, vi } from 'vitest';
import Papa from 'papaparse';
import { CSV_COLUMNS } from '@/lib/templates/csv-columns';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { api, SAMPLE } from '@/tests/app/api/v1/workspaces/[workspace]/templates/templates-support';

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
    expect(await response.json()).toMatchObject({ imported: 1, created: 1, message: 'Imported 1 template.' });
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
    expect(body.error).toBe('The CSV has 1 problem; nothing was imported');
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

  it('writes the counts of its answer in the language of the request (de-DE groups thousands with ".", CLDR via Node’s Intl)', async () => {
    const rows = Array.from({ length: 1200 }, (_, i) => GOOD_ROW.replace('Kart reed 100', `Preview ${String(i).padStart(4, '0')}`));
    const response = await api.importCsv(ws, [HEADER, ...rows].join('\r\n'), { query: '?preview=1', headers: { 'accept-language': 'de-DE,de;q=0.9' } });
    expect(response.status).toBe(200);
    expect((await response.json()).message).toBe('1.200 rows checked: 1.200 new. Nothing in the file has the name of an existing template.');
  });

  it('imports 10,000 rows (batched, one transaction)', async () => {
    const rows = Array.from({ length: 10_000 }, (_, i) => GOOD_ROW.replace('Kart reed 100', `Bulk ${String(i).padStart(5, '0')}`));
    const started = performance.now();
    const response = await api.importCsv(ws, [HEADER, ...rows].join('\r\n'));
    const elapsedMs = performance.now() - started;
    expect(response.status).toBe(201);
    expect(await response.json()).toMatchObject({ imported: 10_000, message: 'Imported 10,000 templates.' });
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

describe('CSV export formula guard', () => {
  it('neutralises a formula in every exported column, port targets included, and imports it back unchanged', async () => {
    // OWASP "CSV Injection": a cell starting with = + - @ tab or CR is run as a formula by spreadsheet programs.
    const formulaTemplate = {
      ...SAMPLE,
      name: '=cmd|calc',
      description: '+1+2',
      notes: '@SUM(A1:A9)',
      portTargets: [{ name: '=1+2', opensCrankDeg: 92, closesCrankDeg: 268 }],
    };
    expect((await api.create(ws, formulaTemplate)).status).toBe(201);
    const csv = await (await api.exportCsv(ws)).text();
    // Read back with papaparse (an independent RFC 4180 reader), then look at every cell of every column.
    const parsed = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });
    expect(parsed.data).toHaveLength(1);
    const row = parsed.data[0]!;
    for (const column of CSV_COLUMNS) {
      const cell = row[column] ?? '';
      const plainNumber = /^[+-]?\d+(\.\d+)?$/.test(cell);
      expect(plainNumber || !/^[=+\-@\t\r]/.test(cell), `${column}: ${cell}`).toBe(true);
    }
    expect(row.port_targets).toBe("'=1+2:92/268");
    expect(row.name).toBe("'=cmd|calc");

    await world.knex('templates').del();
    expect((await api.importCsv(ws, csv)).status).toBe(201);
    const { items } = await (await api.list(ws)).json();
    expect(items[0]).toMatchObject({ name: '=cmd|calc', description: '+1+2', notes: '@SUM(A1:A9)', portTargets: formulaTemplate.portTargets });
  });
});

describe('CSV import encodings', () => {
  // "Motorrad Küche" in ISO-8859-1: ü is the single byte 0xFC, which is not valid UTF-8 (RFC 3629).
  const latin1 = (text: string) => Uint8Array.from(text, (c) => c.charCodeAt(0));
  const LATIN1_CSV = latin1('name,description\nFirst,plain\nMotorrad K\u00fcche,one\n');

  it('refuses a Latin-1 file, naming the encoding problem and the row, and imports nothing', async () => {
    const response = await api.importCsv(ws, LATIN1_CSV);
    expect(response.status).toBe(400);
    const body = await response.json();
    expect(body.problems).toHaveLength(1);
    expect(body.problems[0]).toMatchObject({ row: 3, column: '(encoding)' });
    expect(body.problems[0].message).toMatch(/not UTF-8 text: row 3 has the byte 0xFC/);
    expect(await templateCount()).toBe(0);
  });

  it('refuses it in a multipart upload too', async () => {
    const form = new FormData();
    form.set('file', new Blob([LATIN1_CSV], { type: 'text/csv' }), 'latin1.csv');
    const { POST } = await import('@/app/api/v1/workspaces/[workspace]/templates/import/route');
    const response = await POST(new Request(`http://test.local/api/v1/workspaces/${ws}/templates/import`, { method: 'POST', body: form }), {
      params: Promise.resolve({ workspace: ws }),
    });
    expect(response.status).toBe(400);
    expect((await response.json()).problems[0].row).toBe(3);
  });

  it('decodes a file that declares its charset, and a UTF-8 file with a byte-order mark', async () => {
    const declared = await api.importCsv(ws, LATIN1_CSV, { headers: { 'content-type': 'text/csv; charset=iso-8859-1' } });
    expect(declared.status).toBe(201);
    const bom = new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode('name\nStra\u00dfe 50\n')]);
    expect((await api.importCsv(ws, bom)).status).toBe(201);
    const names = (await (await api.list(ws, '?sort=name')).json()).items.map((t: { name: string }) => t.name);
    expect(names).toEqual(['First', 'Motorrad K\u00fcche', 'Stra\u00dfe 50']);
  });
});

describe('CSV import Idempotency-Key', () => {
  it('answers a retry with the same key with the first result, importing once', async () => {
    const headers = { 'idempotency-key': 'import-7f3c2a' };
    const first = await api.importCsv(ws, `${HEADER}\n${GOOD_ROW}\n`, { headers });
    expect(first.status).toBe(201);
    const firstBody = await first.json();
    const retry = await api.importCsv(ws, `${HEADER}\n${GOOD_ROW}\n`, { headers });
    expect(retry.status).toBe(201);
    expect(retry.headers.get('idempotent-replayed')).toBe('true');
    expect(await retry.json()).toEqual(firstBody);
    expect(await templateCount()).toBe(1);
    // The same key with another file is a client error, not a second import.
    const other = await api.importCsv(ws, `${HEADER}\n${GOOD_ROW.replace('Kart reed 100', 'Other')}\n`, { headers });
    expect(other.status).toBe(422);
    expect(await templateCount()).toBe(1);
  });

  it('imports once when two requests with one key race', async () => {
    const headers = { 'idempotency-key': 'race-1' };
    const csv = `${HEADER}\n${GOOD_ROW}\n`;
    const [a, b] = await Promise.all([api.importCsv(ws, csv, { headers }), api.importCsv(ws, csv, { headers })]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(await templateCount()).toBe(1);
  });
});

describe('CSV import from spreadsheet programs', () => {
  it('reads a semicolon-separated file with decimal commas', async () => {
    const csv = 'name;bore_mm;stroke_mm;advance_marks_deg_btdc;port_targets\r\nKomma 50;40;39,2;"16;17,5";"exhaust:92,5/267,5"\r\n';
    const response = await api.importCsv(ws, csv);
    expect(response.status, await response.clone().text()).toBe(201);
    const { items } = await (await api.list(ws)).json();
    expect(items[0]).toMatchObject({
      name: 'Komma 50',
      boreMm: 40,
      strokeMm: 39.2,
      advanceMarksDeg: [16, 17.5],
      portTargets: [{ name: 'exhaust', opensCrankDeg: 92.5, closesCrankDeg: 267.5 }],
    });
  });

  it('reads a tab-separated file', async () => {
    const response = await api.importCsv(ws, 'name\tbore_mm\trotation\nTabbed 80\t48\tccw\n');
    expect(response.status).toBe(201);
    expect((await (await api.list(ws)).json()).items[0]).toMatchObject({ name: 'Tabbed 80', boreMm: 48, rotation: 'ccw' });
  });

  it('keeps the comma a separator, never a decimal mark, in a comma-separated file', async () => {
    const body = await (await api.importCsv(ws, 'name,bore_mm\n"Comma",\"40,5\"\n')).json();
    expect(body.problems[0]).toMatchObject({ row: 2, column: 'bore_mm' });
  });
});

describe('CSV re-import of templates that exist', () => {
  async function seedOne(): Promise<{ id: number; version: number }> {
    const created = await (await api.create(ws, { ...SAMPLE, name: 'Coastline 125' })).json();
    return { id: created.template.id, version: created.template.version };
  }

  it('previews how many rows are new and how many match by name, writing nothing', async () => {
    const { id } = await seedOne();
    const csv = 'name,bore_mm\ncoastline 125 ,54\nFresh one,40\nFresh two,41\n';
    const response = await api.importCsv(ws, csv, { query: '?preview=1' });
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body).toMatchObject({ preview: true, separatedBy: 'comma', rows: 3, newRows: 2, matchingRows: 1, matches: [{ row: 2, id, version: 1 }] });
    expect(body.message).toBe('3 rows checked: 2 new, 1 row matches an existing template by name. Skip those rows or update the templates from them.');
    expect(await templateCount()).toBe(1);
  });

  it('asks for a choice instead of importing a duplicate', async () => {
    await seedOne();
    const response = await api.importCsv(ws, 'name,bore_mm\nCoastline 125,54\n');
    expect(response.status).toBe(409);
    expect((await response.json()).error).toMatch(/^1 row has the name of an existing template: choose to skip or to update/);
    expect(await templateCount()).toBe(1);
  });

  it('skips matching rows when asked', async () => {
    await seedOne();
    const response = await api.importForm(ws, 'name,bore_mm\nCoastline 125,54\nFresh,40\n', { onMatch: 'skip' });
    expect(response.status).toBe(201);
    expect(await response.json()).toMatchObject({ created: 1, updated: 0, skipped: 1, message: 'Imported 1 new template, 1 row skipped (same name as an existing template).' });
    expect(await templateCount()).toBe(2);
  });

  it('updates matching templates through the history, changing only the columns the file has', async () => {
    const { id } = await seedOne();
    const response = await api.importForm(ws, 'name,bore_mm\nCoastline 125,54\n', { onMatch: 'update', matchVersions: JSON.stringify({ [id]: 1 }) });
    expect(response.status).toBe(201);
    expect((await response.json()).message).toBe('Imported 0 new templates, 1 template updated.');
    const { template } = await (await api.get(ws, id)).json();
    expect(template).toMatchObject({ version: 2, boreMm: 54, strokeMm: SAMPLE.strokeMm, notes: SAMPLE.notes });
    const { revisions } = await (await api.revisions(ws, id)).json();
    expect(revisions[0]).toMatchObject({ version: 2, action: 'import' });
  });

  it('refuses the update when a template changed since the preview, and writes nothing', async () => {
    const { id } = await seedOne();
    expect((await api.patch(ws, id, { version: 1, notes: 'edited meanwhile' })).status).toBe(200);
    const response = await api.importForm(ws, 'name,bore_mm\nCoastline 125,54\nFresh,40\n', { onMatch: 'update', matchVersions: JSON.stringify({ [id]: 1 }) });
    expect(response.status).toBe(409);
    expect((await response.json()).conflicts).toEqual([{ row: 2, name: 'Coastline 125', id, expectedVersion: 1, currentVersion: 2 }]);
    expect(await templateCount()).toBe(1);
    expect((await (await api.get(ws, id)).json()).template.boreMm).toBe(SAMPLE.boreMm);
  });
});
