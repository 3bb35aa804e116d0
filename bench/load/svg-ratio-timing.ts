/**
 * The layout + SVG target's timing, run by bench/load.ts as a process of its own once the server
 * has stopped, on this file bundled the way the server's code is (scripts/server-bundle.mjs): the
 * code as it runs, not through tsx's per-import getters, and not beside the load driver's heap.
 * Prints one line of JSON. Each function gives a flat string, as a response body needs.
 */
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg, shapesToSvg } from '@/lib/sheet/render-svg';
import { sheetRequestSchema } from '@/lib/sheet/sheet-request';
import { wheelLayout } from '@/lib/sheet/wheel-layout';
import { timeAlternating } from '../stats';
import { bareWheelSvg } from './bare-svg';

const DIAMETER_MM = 128.4;
const request = sheetRequestSchema.parse({ kind: 'wheel', diameterMm: DIAMETER_MM });

/**
 * Both sides draw a wheel no earlier call drew, 128.4 mm plus a new hundred-thousandth each time (the
 * same marks and labels throughout), as a server drawing its callers' wheels does and as the load runs
 * ask (distinct diameters). Drawing one wheel over and over lets the runtime's number-to-string cache
 * answer part of the bare writer's String() calls (about 6 % of its time here), which no server sees.
 */
function distinctDiameters(): () => number {
  let calls = 0;
  return () => DIAMETER_MM + (calls++ % 10_000) * 1e-5;
}
const nextLayoutDiameter = distinctDiameters();
const nextBareDiameter = distinctDiameters();

/** Reading a character flattens a string built by appending (as sending it would), so both sides pay for it. */
function flat(svg: string): string {
  svg.charCodeAt(svg.length >> 1);
  return svg;
}

const layoutAndSvg = () => flat(shapesToSvg(wheelLayout({ ...request, diameterMm: nextLayoutDiameter() }).shapes));
const bareSvg = () => flat(bareWheelSvg(nextBareDiameter()));
const wholeSheetSvg = () => flat(renderSvg(buildDrawing(request, { date: new Date('2026-01-01') })));

export type SvgRatioTiming = { diameterMm: number; layoutAndSvgMs: number; bareSvgMs: number; wholeSheetMs: number; blockRatios: number[] };

const BLOCKS = 5;

async function main(): Promise<void> {
  // A long warm-up, so both sides are timed as compiled code, as in a server that has drawn a few sheets; then five
  // blocks of alternating runs, and the block with the median ratio is reported (one slow patch of a shared machine
  // moves one block, not the figure).
  for (let i = 0; i < 3000; i += 1) {
    layoutAndSvg();
    bareSvg();
  }
  const blocks: Array<{ app: number; bare: number; ratio: number }> = [];
  for (let i = 0; i < BLOCKS; i += 1) {
    const [app, yardstick] = await timeAlternating(layoutAndSvg, bareSvg, { warmup: 0, runs: 1000 });
    blocks.push({ app: app.medianMs, bare: yardstick.medianMs, ratio: app.medianMs / yardstick.medianMs });
  }
  const middle = [...blocks].sort((a, b) => a.ratio - b.ratio)[BLOCKS >> 1]!;
  const [whole] = await timeAlternating(wholeSheetSvg, bareSvg, { warmup: 100, runs: 300 });
  const timing: SvgRatioTiming = { diameterMm: DIAMETER_MM, layoutAndSvgMs: middle.app, bareSvgMs: middle.bare, wholeSheetMs: whole.medianMs, blockRatios: blocks.map((b) => b.ratio) };
  console.log(JSON.stringify(timing));
}

void main();
