/**
 * `npm run bench`: the sheet generator's speed targets (issue 3), measured on the
 * library code with NODE_ENV=production. Prints a table, writes bench/results.json,
 * and exits non-zero when a target is missed or a case fails.
 * Optional: BENCH_URL=http://localhost:PORT also times POST /api/v1/sheets on a
 * running `next start`.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { sheetRequestSchema, type SheetRequestInput } from '@/lib/sheet/sheet-request';
import { loadSheetFonts } from '@/pdf/fonts';
import { renderSheetPdf } from '@/pdf/render-sheet-pdf';
import { renderWithRawPdfkit } from './raw-pdfkit';
import { timeAlternating, timeRuns, type Timing } from './stats';

type Row = { name: string; timing?: Timing; value?: number; unit: string; target?: { max: number; of: 'medianMs' | 'value' }; note?: string };

const FIXED_DATE = new Date('2026-01-01T00:00:00Z'); // same title block every run
const WHEEL_100: SheetRequestInput = { kind: 'wheel', diameterMm: 100, advanceMarksDeg: [16, 18, 20], title: 'Bench wheel 100' };
const WHEEL_400: SheetRequestInput = { kind: 'wheel', diameterMm: 400, minPitchMm: 0.6, advanceMarksDeg: [18], title: 'Bench wheel 400' };

function drawingFor(input: SheetRequestInput) {
  return buildDrawing(sheetRequestSchema.parse(input), { date: FIXED_DATE });
}

function layoutAndSvg(input: SheetRequestInput): () => string {
  return () => renderSvg(drawingFor(input));
}

function verdict(row: Row): 'PASS' | 'MISS' | '' {
  if (!row.target) return '';
  const measured = row.target.of === 'medianMs' ? row.timing!.medianMs : row.value!;
  return measured <= row.target.max ? 'PASS' : 'MISS';
}

function printTable(rows: Row[]): void {
  const format = (n: number | undefined) => (n === undefined ? '' : n.toFixed(n >= 100 ? 0 : 2));
  const lines = rows.map((row) => [
    row.name,
    row.timing ? String(row.timing.runs) : '',
    format(row.timing?.medianMs ?? row.value),
    format(row.timing?.p95Ms),
    row.unit,
    row.target ? `≤ ${row.target.max}` : '',
    verdict(row),
    row.note ?? '',
  ]);
  const header = ['case', 'runs', 'median', 'p95', 'unit', 'target', 'result', 'note'];
  const widths = header.map((h, i) => Math.max(h.length, ...lines.map((l) => l[i]!.length)));
  const print = (cells: string[]) => console.log(cells.map((c, i) => c.padEnd(widths[i]!)).join('  ').trimEnd());
  print(header);
  print(widths.map((w) => '-'.repeat(w)));
  lines.forEach(print);
}

async function serverRows(baseUrl: string): Promise<Row[]> {
  const post = async () => {
    const response = await fetch(new URL('/api/v1/sheets', baseUrl), {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ ...WHEEL_100, format: 'pdf' }),
    });
    if (response.status !== 200) throw new Error(`POST /api/v1/sheets answered ${response.status}`);
    await response.arrayBuffer();
  };
  const timing = await timeRuns(post, { warmup: 10, runs: 40 });
  return [{ name: 'POST /api/v1/sheets, 100 mm wheel PDF (next start)', timing, unit: 'ms', note: baseUrl }];
}

async function main(): Promise<void> {
  if (process.env.NODE_ENV !== 'production') console.warn('warning: NODE_ENV is not "production"; run it as `npm run bench`');
  const rows: Row[] = [];
  const loadBefore = os.loadavg();

  const svg100 = drawingFor(WHEEL_100);
  const svg400 = drawingFor(WHEEL_400);
  const levels400 = renderSvg(svg400).includes('data-level="0.5"');
  rows.push({ name: 'layout + SVG, 100 mm wheel', timing: await timeRuns(layoutAndSvg(WHEEL_100), { warmup: 50, runs: 300 }), unit: 'ms', target: { max: 2, of: 'medianMs' }, note: `${svg100.shapes.length} shapes` });
  rows.push({
    name: 'layout + SVG, 400 mm wheel, 0.5° graduations',
    timing: await timeRuns(layoutAndSvg(WHEEL_400), { warmup: 50, runs: 300 }),
    unit: 'ms',
    target: { max: 2, of: 'medianMs' },
    note: `${svg400.shapes.length} shapes${levels400 ? '' : ' — 0.5° NOT drawn'}`,
  });

  // The split, for whoever tunes the layout: the same 400 mm wheel, layout alone and SVG alone.
  const request400 = sheetRequestSchema.parse(WHEEL_400);
  rows.push({ name: '  of which layout (buildDrawing), 400 mm', timing: await timeRuns(() => buildDrawing(request400, { date: FIXED_DATE }), { warmup: 20, runs: 200 }), unit: 'ms' });
  rows.push({ name: '  of which SVG (renderSvg), 400 mm', timing: await timeRuns(() => renderSvg(svg400), { warmup: 20, runs: 200 }), unit: 'ms' });

  const fonts = await loadSheetFonts();
  const onePage = drawingFor(WHEEL_100);
  if (onePage.pages.length !== 1) throw new Error(`the 100 mm wheel should fit one A4 page, got ${onePage.pages.length}`);
  const coldStart = performance.now();
  await renderSheetPdf(onePage);
  const coldMs = performance.now() - coldStart;
  const [reactPdf, rawPdfkit] = await timeAlternating(
    () => renderSheetPdf(onePage),
    () => renderWithRawPdfkit(onePage, fonts),
    { warmup: 10, runs: 40 },
  );
  rows.push({ name: 'one-page wheel PDF (react-pdf), first render', value: coldMs, unit: 'ms', note: 'cold: fonts parsed, code compiled' });
  rows.push({ name: 'one-page wheel PDF (react-pdf), warm', timing: reactPdf, unit: 'ms', target: { max: 60, of: 'medianMs' } });
  rows.push({ name: 'same page, raw pdfkit (react-pdf’s engine)', timing: rawPdfkit, unit: 'ms' });
  rows.push({ name: 'ratio react-pdf / raw pdfkit (medians)', value: reactPdf.medianMs / rawPdfkit.medianMs, unit: '×', target: { max: 1.5, of: 'value' } });

  const request100 = sheetRequestSchema.parse(WHEEL_100);
  rows.push({
    name: 'request → PDF, 100 mm wheel (layout + PDF)',
    timing: await timeRuns(() => renderSheetPdf(buildDrawing(request100, { date: FIXED_DATE })), { warmup: 5, runs: 30 }),
    unit: 'ms',
  });
  const tiled = drawingFor(WHEEL_400);
  rows.push({ name: `400 mm wheel PDF, ${tiled.pages.length} A4 pages`, timing: await timeRuns(() => renderSheetPdf(tiled), { warmup: 3, runs: 30 }), unit: 'ms' });

  if (process.env.BENCH_URL) rows.push(...(await serverRows(process.env.BENCH_URL)));

  const peakRssMb = process.resourceUsage().maxRSS / 1024; // maxRSS is in KiB
  rows.push({ name: 'peak memory of the run (max RSS)', value: peakRssMb, unit: 'MiB' });

  printTable(rows);
  // Timings on a shared machine move with its load and its processor: both go with the figures.
  const loadAfter = os.loadavg();
  const cpus = os.cpus();
  const cpuModel = cpus[0]?.model.trim() || 'unknown';
  const load = { before: loadBefore[0]!, after: loadAfter[0]!, cpus: cpus.length, averagesBefore: loadBefore, averagesAfter: loadAfter };
  const averages = (a: number[]) => a.map((v) => v.toFixed(2)).join(' / ');
  console.log(`\nload average (1 / 5 / 15 min) ${averages(loadBefore)} → ${averages(loadAfter)} on ${load.cpus} CPUs`);
  console.log(`CPU ${cpuModel}`);
  const results = {
    measuredAt: new Date().toISOString(),
    node: process.version,
    nodeEnv: process.env.NODE_ENV ?? null,
    cpuModel,
    load,
    rows: rows.map((row) => ({ ...row, result: verdict(row) || undefined })),
  };
  const file = path.join(process.cwd(), 'bench', 'results.json');
  // Keep the load benchmark's figures (`npm run bench:load` writes them under "load").
  let serverLoad: unknown;
  try {
    serverLoad = (JSON.parse(readFileSync(file, 'utf8')) as { load?: unknown }).load;
  } catch {
    serverLoad = undefined;
  }
  writeFileSync(file, JSON.stringify({ ...results, load: serverLoad }, null, 2) + '\n');
  console.log(`written ${path.relative(process.cwd(), file)}`);
  const missed = rows.filter((row) => verdict(row) === 'MISS');
  if (missed.length) {
    console.error(`MISS: ${missed.map((row) => row.name).join('; ')}`);
    process.exitCode = 1;
  }
}

main().catch((error: unknown) => {
  console.error('bench failed:', error);
  process.exitCode = 1;
});
