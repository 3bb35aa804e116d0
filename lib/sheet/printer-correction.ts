import { mapShapes } from './affine';
import type { Shape } from './drawing';

/**
 * printerScaleX/Y say what the printer makes of one millimetre (measured ÷ true, 0.9–1.1).
 * Pre-scaling every coordinate by 1/scale per axis makes the print come out true:
 * circles become ellipses, text positions move, text sizes stay.
 */
export type PrinterScale = { printerScaleX: number; printerScaleY: number };

export function correctionFactors({ printerScaleX, printerScaleY }: PrinterScale): { x: number; y: number } {
  return { x: 1 / printerScaleX, y: 1 / printerScaleY };
}

export function correctForPrinter(shapes: readonly Shape[], scale: PrinterScale): Shape[] {
  const { x, y } = correctionFactors(scale);
  return mapShapes(shapes, { scaleX: x, scaleY: y, dxMm: 0, dyMm: 0 });
}

/** "x 0.980 · y 1.000 (drawn at 102.04 % × 100.00 %)" for the title block. */
export function describeCorrection(scale: PrinterScale): string {
  const { x, y } = correctionFactors(scale);
  if (scale.printerScaleX === 1 && scale.printerScaleY === 1) return 'none (printer scale 1.000 × 1.000)';
  return `printer scale x ${scale.printerScaleX.toFixed(3)} · y ${scale.printerScaleY.toFixed(3)}, drawn at ${(x * 100).toFixed(2)} % × ${(y * 100).toFixed(2)} %`;
}
