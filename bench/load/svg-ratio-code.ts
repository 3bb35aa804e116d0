/**
 * What the layout + SVG target times, bundled by bench/load.ts the way the server's code is
 * (scripts/server-bundle.mjs) so the timing is of the code as it runs, not of tsx's per-import
 * getters. Each function gives a flat string, as a response body needs.
 */
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg, shapesToSvg } from '@/lib/sheet/render-svg';
import { sheetRequestSchema } from '@/lib/sheet/sheet-request';
import { wheelLayout } from '@/lib/sheet/wheel-layout';
import { bareWheelSvg } from './bare-svg';

export const RATIO_DIAMETER_MM = 128.4;
const request = sheetRequestSchema.parse({ kind: 'wheel', diameterMm: RATIO_DIAMETER_MM });

/** Reading a character flattens a string built by appending (as sending it would), so both sides pay for it. */
function flat(svg: string): string {
  svg.charCodeAt(svg.length >> 1);
  return svg;
}

export const layoutAndSvg = () => flat(shapesToSvg(wheelLayout(request).shapes));
export const bareSvg = () => flat(bareWheelSvg(RATIO_DIAMETER_MM));
export const wholeSheetSvg = () => flat(renderSvg(buildDrawing(request, { date: new Date('2026-01-01') })));
