import { DIAMETER_RANGE_MM, STRIP_WIDTH_RANGE_MM } from '@/lib/sheet/sheet-request';
import { sheetRequestFields } from '@/lib/sheet/sheet-request-fields';
import { mmToInch } from '@/lib/units';
import { LENGTH_FIELDS, type GeneratorFormValues } from './form-values';

type LengthField = (typeof LENGTH_FIELDS)[number];
type RangeMm = { readonly min: number; readonly max: number };

/** The shared schema's range of each length the mm/in toggle converts (hub hole: 0 up to the largest disc, as the schema has it). */
const RANGE_MM: Record<LengthField, RangeMm> = {
  diameterMm: DIAMETER_RANGE_MM,
  hubHoleMm: { min: 0, max: DIAMETER_RANGE_MM.max },
  innerDiameterMm: DIAMETER_RANGE_MM,
  outerDiameterMm: DIAMETER_RANGE_MM,
  stripWidthMm: STRIP_WIDTH_RANGE_MM,
};

const RANGE_PLACES = 3;
const scale = 10 ** RANGE_PLACES;
// A tiny allowance so a bound that is a whole number of thousandths (25.4 mm = 1 in) is not pushed one step.
const SLACK = 1e-9;

/**
 * A range in inches, rounded inwards to thousandths: 20 mm is 0.78740 in, and
 * 0.787 in (19.99 mm) would be refused, so the lower bound rounds up to 0.788
 * and the upper one down (600 mm → 23.622 in). Every number shown is accepted.
 */
export function inchRange(rangeMm: RangeMm): { min: number; max: number } {
  return {
    min: Math.ceil(mmToInch(rangeMm.min) * scale - SLACK) / scale || 0, // never -0 for a range from 0
    max: Math.floor(mmToInch(rangeMm.max) * scale + SLACK) / scale,
  };
}

/** A length the user typed in inches, as the form shows it (4 places, like the toggle's conversion). */
const typedInches = (value: number) => String(Math.round(value * 10_000) / 10_000);

function isLengthField(field: string): field is LengthField {
  return (LENGTH_FIELDS as readonly string[]).includes(field);
}

export type LengthIssue = { path: string; code: string; message: string };

/**
 * The message for one validation issue in the unit the user typed in. The
 * schema (and so the API) speaks mm; with the toggle on inches the range of a
 * converted length field is restated in inches from the schema's own range
 * constants. Other fields, other units and unknown issues keep the schema's message.
 */
export function messageInTypedUnit(issue: LengthIssue, values: GeneratorFormValues): string {
  const field = issue.path;
  if (values.lengthUnit !== 'in' || !isLengthField(field)) return issue.message;
  const { label } = sheetRequestFields[field];
  const { min, max } = inchRange(RANGE_MM[field]);
  const allowed = `${min}–${max} in`;
  switch (issue.code) {
    case 'too_small':
      return `${label} must be at least ${min} in (allowed ${allowed})`;
    case 'too_big':
      return `${label} must be at most ${max} in (allowed ${allowed})`;
    case 'invalid_type':
      return `${label} must be a number, ${allowed}`;
    case 'custom':
      return crossFieldMessage(field, label, values, allowed) ?? issue.message;
    default:
      return issue.message;
  }
}

/** The schema's checks between fields (required, inner below outer, hub below disc), with the other length in inches. */
function crossFieldMessage(field: LengthField, label: string, values: GeneratorFormValues, allowed: string): string | undefined {
  if (!Number.isFinite(values[field])) return `${label} is required for a ${values.kind} sheet (allowed ${allowed})`;
  if (field === 'innerDiameterMm' && Number.isFinite(values.outerDiameterMm))
    return `${label} must be smaller than the outer diameter (${typedInches(values.outerDiameterMm)} in)`;
  if (field === 'hubHoleMm' && Number.isFinite(values.diameterMm))
    return `${label} must be smaller than the disc diameter (0 to under ${typedInches(values.diameterMm)} in)`;
  return undefined;
}
