import type { Shape } from './drawing';
import { MM_PER_INCH } from '../fields/length';
import { line, rect, text } from './shapes';
import { STROKE_MM, TEXT_MM } from './sheet-style';
import { wrapText } from './text-wrap';

/**
 * The scale check: 100 mm and 4 in (101.6 mm, the exact international inch of 1959) bars,
 * horizontal and vertical since printers scale the axes differently, and an ISO/IEC 7810
 * ID-1 card outline (85.60 × 53.98 mm) anyone can hold a bank card against.
 */
export const CHECK_BARS_MM = [100, 4 * MM_PER_INCH] as const;
export const ID1_CARD_MM = { widthMm: 85.6, heightMm: 53.98 } as const;

function bar(lengthMm: number, axis: 'x' | 'y', x0: number, y0: number): Shape[] {
  // (u, v): u along the bar, v across it (subdivisions on the +v side).
  const P = (u: number, v: number): [number, number] => (axis === 'x' ? [x0 + u, y0 + v] : [x0 - v, y0 + u]);
  const seg = (u1: number, v1: number, u2: number, v2: number, strokeMm: number, data?: Shape['data']) => {
    const [a, b] = P(u1, v1);
    const [c, d] = P(u2, v2);
    return line(a, b, c, d, strokeMm, data);
  };
  const data = { checkMm: lengthMm, axis, role: 'check-bar' };
  const shapes: Shape[] = [seg(0, 0, lengthMm, 0, STROKE_MM.outline, data)];
  shapes.push(seg(0, -2, 0, 3, STROKE_MM.outline, { role: 'check-end', axis, checkMm: lengthMm }));
  shapes.push(seg(lengthMm, -2, lengthMm, 3, STROKE_MM.outline, { role: 'check-end', axis, checkMm: lengthMm }));
  for (let mm = 1; mm < lengthMm - 1e-9; mm += 1) {
    const depth = mm % 10 === 0 ? 2.2 : mm % 5 === 0 ? 1.6 : 1;
    shapes.push(seg(mm, 0, mm, depth, STROKE_MM.fine, { role: 'check-mm' }));
  }
  return shapes;
}

function drawCheckBlock(): { shapes: Shape[]; widthMm: number; heightMm: number } {
  const shapes: Shape[] = [];
  const [hundred, fourInch] = CHECK_BARS_MM;
  const top = 8;
  shapes.push(text(0, 3.2, 'Scale check: measure before you use this sheet', TEXT_MM.heading, { weight: 'bold' }));
  // Vertical bars, subdivisions to their left, labels rotated along them.
  shapes.push(...bar(hundred, 'y', 6, top), ...bar(fourInch, 'y', 15, top));
  shapes.push(text(7.6, top + 2, '100 mm', TEXT_MM.small, { rotateDeg: 90, data: { role: 'check-label' } }));
  shapes.push(text(16.6, top + 2, '4 in = 101.6 mm', TEXT_MM.small, { rotateDeg: 90, data: { role: 'check-label' } }));
  // Horizontal bars, subdivisions below, labels above.
  const left = 24;
  shapes.push(text(left, top + 2, '100 mm', TEXT_MM.small, { data: { role: 'check-label' } }), ...bar(hundred, 'x', left, top + 4));
  shapes.push(text(left, top + 12, '4 in = 101.6 mm', TEXT_MM.small, { data: { role: 'check-label' } }), ...bar(fourInch, 'x', left, top + 14));
  const cardTop = top + 21;
  shapes.push(rect(left, cardTop, ID1_CARD_MM.widthMm, ID1_CARD_MM.heightMm, STROKE_MM.outline, 'none', { checkMm: ID1_CARD_MM.widthMm, role: 'card' }));
  const cardText = wrapText('ID-1 card outline 85.60 × 53.98 mm (ISO/IEC 7810): a bank card should cover it exactly.', TEXT_MM.small, ID1_CARD_MM.widthMm - 8);
  cardText.forEach((row, i) => shapes.push(text(left + 4, cardTop + 8 + i * 3, row, TEXT_MM.small)));
  const help = wrapText(
    'Measure each bar along and across the page. If a 100 mm bar is not 100.0 mm, enter both lengths in the printer check to make a printer profile.',
    TEXT_MM.small,
    ID1_CARD_MM.widthMm + 4,
  );
  const helpTop = cardTop + ID1_CARD_MM.heightMm + 4;
  help.forEach((row, i) => shapes.push(text(left, helpTop + i * 2.8, row, TEXT_MM.small)));
  return { shapes, widthMm: left + fourInch + 1, heightMm: Math.max(top + fourInch + 3, helpTop + help.length * 2.8) };
}

let cached: ReturnType<typeof drawCheckBlock> | undefined;

/** The check block never changes (the printer correction is applied later), so it is drawn once. */
export function checkBlockShapes(): { readonly shapes: readonly Shape[]; widthMm: number; heightMm: number } {
  cached ??= drawCheckBlock();
  return cached;
}
