import type { Fill } from '@/lib/sheet/drawing';
import { mmToPt } from '@/lib/units';
import type { Painter } from './painter';

/** Solid fills; 'grey15' is 15 % black ink (85 % white), which a mono laser prints as a dot screen. */
const SOLID_FILL: Record<Exclude<Fill, 'none' | 'hatch'>, string> = {
  black: '#000000',
  white: '#ffffff',
  grey15: '#d9d9d9',
};

// The SVG renderer's hatch pattern (lib/sheet/render-svg.ts): 1.2 mm pitch, 0.15 mm lines.
export const HATCH_PITCH_MM = 1.2;
export const HATCH_STROKE_MM = 0.15;
const MAX_HATCH_LINES = 4000;

export type BoxPt = { minXPt: number; minYPt: number; maxXPt: number; maxYPt: number };

/**
 * Fills and/or strokes the outline `tracePath` builds. A hatch is 45° lines,
 * black, clipped to the outline: it survives a mono printer, unlike a colour.
 */
export function paintOutline(p: Painter, tracePath: () => void, fill: Fill, strokePt: number, boxPt: BoxPt): void {
  const stroked = strokePt > 0;
  if (fill === 'hatch') {
    p.save();
    tracePath();
    p.clip();
    hatchBox(p, boxPt);
    p.restore();
  } else if (fill !== 'none') {
    p.save();
    tracePath();
    if (stroked) p.lineWidth(strokePt).fillAndStroke(SOLID_FILL[fill], '#000000');
    else p.fill(SOLID_FILL[fill]);
    p.restore();
    return;
  }
  if (!stroked) return;
  tracePath();
  p.lineWidth(strokePt).stroke();
}

/**
 * Lines x + y = c across the box (rising to the right on the page, as the SVG's
 * pattern rotated 45°), one every HATCH_PITCH_MM measured square to the lines.
 */
function hatchBox(p: Painter, { minXPt, minYPt, maxXPt, maxYPt }: BoxPt): void {
  const stepPt = mmToPt(HATCH_PITCH_MM) * Math.SQRT2;
  const fromC = minXPt + minYPt;
  const count = Math.min(MAX_HATCH_LINES, Math.ceil((maxXPt + maxYPt - fromC) / stepPt));
  for (let i = 0; i <= count; i += 1) {
    const c = fromC + i * stepPt;
    p.moveTo(c - minYPt, minYPt).lineTo(c - maxYPt, maxYPt);
  }
  p.lineWidth(mmToPt(HATCH_STROKE_MM)).stroke();
}

export function boxOfPoints(pointsPt: ReadonlyArray<readonly [number, number]>, padPt = 0): BoxPt {
  let minXPt = Infinity;
  let minYPt = Infinity;
  let maxXPt = -Infinity;
  let maxYPt = -Infinity;
  for (const [x, y] of pointsPt) {
    minXPt = Math.min(minXPt, x);
    minYPt = Math.min(minYPt, y);
    maxXPt = Math.max(maxXPt, x);
    maxYPt = Math.max(maxYPt, y);
  }
  return { minXPt: minXPt - padPt, minYPt: minYPt - padPt, maxXPt: maxXPt + padPt, maxYPt: maxYPt + padPt };
}
