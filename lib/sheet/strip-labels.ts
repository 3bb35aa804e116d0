import type { Shape, ShapeData } from './drawing';
import { spreadInRange } from './label-fan';
import { line, rect, text } from './shapes';
import { STROKE_MM, TEXT_MM, textWidthMm } from './sheet-style';

/**
 * Mark labels inside a strip piece: the zone below the numerals, down to the strip's lower cut
 * edge, holds them, so cutting the strip out keeps every label. Where the zone is deep enough the
 * labels stand across the strip (reading upwards, one label thickness apart); otherwise they lie
 * along it in one row. Marks closer than their labels fan their labels out sideways, each joined
 * to its own mark by a fine leader; labels that cannot be placed are left off (the sheet warns).
 */

/** The smallest label size on a strip, mm (about 3 pt): below this a label is not written. */
export const MIN_STRIP_LABEL_MM = 1;
const FAN_MIN_MM = 0.4;
const PAD_MM = 0.3;

export type Zone = { topMm: number; bottomMm: number; fromMm: number; toMm: number };
export type InkBox = { x0: number; x1: number; y0: number; y1: number };
export type StripMark = { xMm: number; label: string; line: ShapeData; labelData: ShapeData; dashMm?: number; strokeMm?: number };

/** The white ground behind a label, so hatching and lines under it never make it unreadable. */
function ground(box: InkBox, tag: (d: ShapeData) => ShapeData): Shape {
  return rect(box.x0, box.y0, box.x1 - box.x0, box.y1 - box.y0, 0, 'white', tag({ role: 'label-ground' }));
}

function horizontalBox(xMm: number, baselineMm: number, label: string, sizeMm: number): InkBox {
  const width = textWidthMm(label, sizeMm);
  return { x0: xMm - width / 2, x1: xMm + width / 2, y0: baselineMm - 0.8 * sizeMm, y1: baselineMm + 0.25 * sizeMm };
}

export type PlacedLabels = { shapes: Shape[]; occupied: InkBox[]; unlabelled: number };

/**
 * The mark lines (from the strip's top edge `stripTopMm`) and their labels. `grounds` come first in
 * the returned shapes only in the sense that each label's white ground is drawn right before it.
 */
export function stripMarkLabels(marks: readonly StripMark[], stripTopMm: number, zone: Zone, tag: (d: ShapeData) => ShapeData): PlacedLabels {
  const shapes: Shape[] = [];
  const occupied: InkBox[] = [];
  const zoneMm = zone.bottomMm - zone.topMm;
  const longestChars = Math.max(1, ...marks.map((m) => m.label.length));
  const perChar = textWidthMm('m', 1);
  const across = Math.min(TEXT_MM.small, (zoneMm - 1.2) / (longestChars * perChar));
  const upright = across >= 1.4;
  const size = upright ? across : Math.min(TEXT_MM.small, (zoneMm - FAN_MIN_MM) / 1.15);
  const xs = [...new Set(marks.map((m) => m.xMm))].sort((a, b) => a - b);
  const lineTo = new Map<number, number>();
  const drawn: Shape[] = [];
  let unlabelled = 0;
  if (size >= MIN_STRIP_LABEL_MM && xs.length) {
    const longestMm = longestChars * perChar * size;
    const pitch = upright ? size * 1.3 : longestMm + 1;
    const range = (upright ? [zone.fromMm + size * 0.6, zone.toMm - size * 0.6] : [zone.fromMm + longestMm / 2, zone.toMm - longestMm / 2]) as [number, number];
    const fanMm = upright ? zoneMm - longestMm : zoneMm - 1.05 * size;
    const placed = range[1] >= range[0] ? spreadInRange(xs, pitch, range, upright ? Math.max(2.2 * fanMm, 3 * pitch) : 6 * pitch) : new Map<number, number>();
    for (const mark of marks) {
      const lx = placed.get(mark.xMm);
      placed.delete(mark.xMm);
      if (lx === undefined) continue;
      const width = textWidthMm(mark.label, size);
      const box: InkBox = upright
        ? { x0: lx - 0.5 * size, x1: lx + 0.5 * size, y0: zone.bottomMm - width, y1: zone.bottomMm }
        : horizontalBox(lx, zone.bottomMm - 0.25 * size, mark.label, size);
      const moved = Math.abs(lx - mark.xMm) > 0.05;
      if (moved) {
        lineTo.set(mark.xMm, zone.topMm);
        drawn.push(line(mark.xMm, zone.topMm, lx, box.y0 - 0.25, STROKE_MM.fine, tag({ role: 'label-leader' })));
      } else lineTo.set(mark.xMm, box.y0 - 0.25);
      drawn.push(ground(box, tag));
      drawn.push(
        upright
          ? text(lx + 0.275 * size, zone.bottomMm, mark.label, size, { anchor: 'start', rotateDeg: -90, weight: 'bold', data: tag(mark.labelData) })
          : text(lx, zone.bottomMm - 0.25 * size, mark.label, size, { anchor: 'middle', weight: 'bold', data: tag(mark.labelData) }),
      );
      occupied.push(box);
    }
  }
  // Lines first, so each label's white ground covers the neighbouring marks' lines it sits on.
  for (const mark of marks) {
    const end = lineTo.get(mark.xMm);
    if (end === undefined && !lineTo.has(mark.xMm)) unlabelled += 1;
    shapes.push(line(mark.xMm, stripTopMm, mark.xMm, end ?? zone.topMm, mark.strokeMm ?? STROKE_MM.heavy, tag(mark.line), mark.dashMm));
    lineTo.set(mark.xMm, end ?? zone.topMm);
  }
  shapes.push(...drawn);
  return { shapes, occupied, unlabelled };
}

function overlaps(a: InkBox, b: InkBox): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

/**
 * A horizontal label of `label` at size `sizeMm` near `wantedXMm` (its centre) that stays inside the
 * zone and clear of `occupied`: the wanted place first, then 1 mm steps either way, at the zone's
 * middle, top or bottom. Undefined when nowhere is free.
 */
export function freeLabelSpot(label: string, sizeMm: number, wantedXMm: number, zone: Zone, occupied: readonly InkBox[]): { xMm: number; baselineMm: number; box: InkBox } | undefined {
  const width = textWidthMm(label, sizeMm);
  const lo = zone.fromMm + PAD_MM + width / 2;
  const hi = zone.toMm - PAD_MM - width / 2;
  if (hi < lo || zone.bottomMm - zone.topMm < 1.05 * sizeMm) return undefined;
  const baselines = [(zone.topMm + zone.bottomMm + 0.55 * sizeMm) / 2, zone.topMm + 0.8 * sizeMm, zone.bottomMm - 0.25 * sizeMm];
  const start = Math.min(hi, Math.max(lo, wantedXMm));
  for (let step = 0; step <= 2 * (hi - lo) + 2; step += 1) {
    const offset = (step % 2 === 0 ? 1 : -1) * Math.ceil(step / 2);
    const xMm = start + offset;
    if (xMm < lo - 1e-9 || xMm > hi + 1e-9) continue;
    for (const baselineMm of baselines) {
      const box = horizontalBox(xMm, baselineMm, label, sizeMm);
      if (!occupied.some((o) => overlaps(o, { x0: box.x0 - 0.4, x1: box.x1 + 0.4, y0: box.y0, y1: box.y1 }))) return { xMm, baselineMm, box };
    }
  }
  return undefined;
}
