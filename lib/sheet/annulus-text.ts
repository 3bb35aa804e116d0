import { textCornersMm } from './bounds';
import type { ShapeData, TextShape } from './drawing';
import { polarPointMm } from './polar';
import { text } from './shapes';

/**
 * Text laid along a circle (tangential, never upside down) that must stay inside an annulus:
 * a wheel disc (inner radius the hub hole) or a ring. The straight text box bulges past its
 * baseline circle at its ends (by about w²/8r), so small circles are checked on the box itself.
 */

/** The smallest size such text is shrunk to before it is left off, mm (about 2.8 pt). */
const MIN_PIECE_TEXT_MM = 1;

export type Annulus = { centreMm: [number, number]; innerMm: number; outerMm: number };

function distanceToSegment([px, py]: readonly [number, number], [ax, ay]: readonly [number, number], [bx, by]: readonly [number, number]): number {
  const dx = bx - ax;
  const dy = by - ay;
  const t = Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy || 1)));
  return Math.hypot(ax + t * dx - px, ay + t * dy - py);
}

/** Whether a text's inked box lies within the annulus (corners inside the outer circle, edges clear of the inner). */
export function textInAnnulus(shape: TextShape, annulus: Annulus, padMm = 0.1): boolean {
  const corners = textCornersMm(shape);
  const c = annulus.centreMm;
  if (corners.some(([x, y]) => Math.hypot(x - c[0], y - c[1]) > annulus.outerMm - padMm)) return false;
  if (annulus.innerMm <= 0) return true;
  return corners.every((p, i) => distanceToSegment(c, p, corners[(i + 1) % 4]!) >= annulus.innerMm + padMm);
}

/**
 * A tangential text centred (along and across) on `radiusMm` at `angleCwDeg`, shrunk from
 * `sizeMm` in 10 % steps until it fits the annulus; undefined when even MIN_PIECE_TEXT_MM does not.
 */
export function tangentialText(
  label: string,
  sizeMm: number,
  angleCwDeg: number,
  radiusMm: number,
  annulus: Annulus,
  options: { weight?: 'normal' | 'bold'; data?: ShapeData } = {},
): TextShape | undefined {
  const theta = ((angleCwDeg % 360) + 360) % 360;
  const rotateDeg = theta > 90 && theta < 270 ? theta + 180 : theta;
  const up = rotateDeg === theta ? 1 : -1; // +1: glyph tops face outward
  for (let size = sizeMm; size >= MIN_PIECE_TEXT_MM - 1e-9; size *= 0.9) {
    // Ink spans 0.8 of the size above the baseline and 0.25 below: its middle is 0.275 × size above.
    const [x, y] = polarPointMm(annulus.centreMm, radiusMm - up * 0.275 * size, theta);
    const shape = text(x, y, label, size, { anchor: 'middle', rotateDeg, weight: options.weight ?? 'normal', ...(options.data ? { data: options.data } : {}) });
    if (textInAnnulus(shape, annulus)) return shape;
  }
  return undefined;
}
