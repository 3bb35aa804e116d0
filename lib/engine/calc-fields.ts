import { lengthField, numberField } from '../fields/builders';
import { defineFields } from '../fields/field';
import { PIN_OFFSET_LIMIT_MM, offsetCrankGeometryProblem } from './offset-slider-crank';
import { crankGeometryProblem } from './slider-crank';

/**
 * What the calculator field tables share: the engine's ranges and fields, and the
 * checks across them. Every message names the field by its label with its allowed range.
 */

export const STROKE_RANGE_MM = { min: 1, max: 300 } as const;
export const ROD_RANGE_MM = { min: 1, max: 1000 } as const;
export const DECK_RANGE_MM = { min: -20, max: 20 } as const;
export const PORT_HEIGHT_RANGE_MM = { min: 0, max: 400 } as const;
export const MAX_CALC_PORTS = 12;
export const PIN_OFFSET_RANGE_MM = { min: -PIN_OFFSET_LIMIT_MM, max: PIN_OFFSET_LIMIT_MM } as const;

/** The engine's measurements, shared by every calculator's field table. */
export const crankFields = defineFields({
  strokeMm: lengthField({ label: 'Stroke', ...STROKE_RANGE_MM }),
  rodMm: lengthField({ label: 'Con-rod length', ...ROD_RANGE_MM }),
  /** Positive toward the side the crank pin swings to just after TDC. */
  pinOffsetMm: lengthField({ label: 'Wrist-pin offset', ...PIN_OFFSET_RANGE_MM }).optional(),
});

/** A crank angle, 0–360° in crank order. */
export const crankAngleField = (label: string) => numberField({ label, min: 0, max: 360, unit: '°' });

type RefineContext = { addIssue: (issue: { code: 'custom'; path: string[]; message: string }) => void };

/**
 * Adds the "rod must be longer than the crank throw" issue, with the allowed range.
 * Zod runs object refinements after range failures too, so a stroke already out of
 * range is left to its own message. Returns whether the geometry is usable.
 */
export function checkCrankGeometry(value: { strokeMm: number; rodMm: number }, ctx: RefineContext): boolean {
  if (!strokeInRange(value.strokeMm)) return false;
  const problem = crankGeometryProblem(value);
  if (!problem) return true;
  ctx.addIssue({
    code: 'custom',
    path: [problem.field],
    message: `${problem.message}: allowed over ${value.strokeMm / 2} up to ${ROD_RANGE_MM.max} mm`,
  });
  return false;
}

export function strokeInRange(strokeMm: number): boolean {
  return strokeMm >= STROKE_RANGE_MM.min && strokeMm <= STROKE_RANGE_MM.max;
}

/**
 * checkCrankGeometry, then the offset's own limit: |e| < l − a or the mechanism locks at BDC.
 * An offset already out of its ±5 mm range is left to the field's own message.
 */
export function checkOffsetCrankGeometry(
  value: { strokeMm: number; rodMm: number; pinOffsetMm?: number | undefined },
  ctx: RefineContext,
): boolean {
  if (!checkCrankGeometry(value, ctx)) return false;
  const pinOffsetMm = value.pinOffsetMm ?? 0;
  if (typeof pinOffsetMm !== 'number' || !(Math.abs(pinOffsetMm) <= PIN_OFFSET_LIMIT_MM)) return false;
  const problem = offsetCrankGeometryProblem({ ...value, pinOffsetMm });
  if (!problem) return true;
  ctx.addIssue({ code: 'custom', path: [problem.field], message: problem.message });
  return false;
}
