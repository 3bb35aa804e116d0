import { formatDecimal } from '@/lib/format/number-format';
import { rangeMessage, type RangeProblem } from './range-text';

/**
 * The only mm ↔ inch code. Forms and the API hold lengths in mm; a length field
 * shows them in the unit the user chose, and its messages are written in that
 * unit from the field's own range (never by rewriting an mm message).
 */

export type LengthUnit = 'mm' | 'in';

/** Exact by definition: the international inch of the 1959 agreement (NIST). */
export const MM_PER_INCH = 25.4;

/** Decimal places a length is shown with: mm to 0.001 (dial gauge resolution), inches to 0.0001. */
const SHOWN_PLACES: Record<LengthUnit, number> = { mm: 3, in: 4 };
/** Range limits in inches are written to thousandths. */
const RANGE_PLACES_IN = 3;
// So a limit that is a whole number of thousandths (25.4 mm = 1.000 in) is not pushed one step by float error.
const SLACK = 1e-9;

export function mmToUnit(mm: number, unit: LengthUnit): number {
  return unit === 'in' ? mm / MM_PER_INCH : mm;
}

/** A value typed in `unit`, in mm to a nanometre, so 1.5 in is 38.1 mm and not 38.099999999999994. */
export function unitToMm(value: number, unit: LengthUnit): number {
  return unit === 'in' ? Math.round(value * MM_PER_INCH * 1e6) / 1e6 : value;
}

/** The text a field shows for a value in mm: trailing zeros dropped, blank for no value. */
export function lengthText(mm: number, unit: LengthUnit): string {
  if (!Number.isFinite(mm)) return '';
  return String(Number(mmToUnit(mm, unit).toFixed(SHOWN_PLACES[unit])));
}

/** A length for reading in the reader's locale: "12.700 mm", "0.5000 in" (en-GB), "12,700 mm" (de-DE). */
export function formatLength(mm: number, unit: LengthUnit, locale: string): string {
  return `${formatDecimal(mmToUnit(mm, unit), locale, { places: SHOWN_PLACES[unit] })} ${unit}`;
}

export type RangeMm = { readonly min: number; readonly max: number };

/**
 * A range in the shown unit, rounded inwards so every number shown is accepted:
 * 20 mm is 0.78740 in, and 0.787 in (19.99 mm) would be refused, so the lower
 * limit rounds up to 0.788 and the upper one down (600 mm → 23.622 in).
 */
export function rangeInUnit(rangeMm: RangeMm, unit: LengthUnit): { min: number; max: number } {
  if (unit === 'mm') return { min: rangeMm.min, max: rangeMm.max };
  const scale = 10 ** RANGE_PLACES_IN;
  return {
    min: Math.ceil(mmToUnit(rangeMm.min, unit) * scale - SLACK) / scale || 0, // never -0 for a range from 0
    max: Math.floor(mmToUnit(rangeMm.max, unit) * scale + SLACK) / scale,
  };
}

/** "Diameter must be at least 0.788 in (allowed 0.788–23.622 in)": a length field's range message in the shown unit. */
export function lengthRangeMessage(
  problem: RangeProblem,
  field: { label: string; min: number; max: number; hint?: string | undefined },
  unit: LengthUnit,
): string {
  return rangeMessage(problem, { ...rangeInUnit(field, unit), label: field.label, unit, hint: field.hint });
}
