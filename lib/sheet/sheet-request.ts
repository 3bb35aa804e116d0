import { z } from 'zod';
import { fieldsOf, shapeOf } from '../fields/field';
import { lengthRangeMessage, lengthText, rangeInUnit, type LengthUnit } from '../fields/length';
import { rangeText } from '../fields/range-text';
import { DIAMETER_RANGE_MM, MAX_SCRIBE_ROWS } from './sheet-limits';
import { sheetRequestFields } from './sheet-request-fields';

/**
 * The one schema for a sheet request: the generator form (browser), the preview
 * server action and POST /api/v1/sheets all validate with it, derived from the
 * field table (sheet-request-fields.ts) plus the rules across fields. Lengths in
 * mm, angles in degrees. Every message names the field by its label and its allowed range.
 */

export { ADVANCE_RANGE_DEG, DIAMETER_RANGE_MM, MAX_ADVANCE_MARKS, MAX_PORT_EVENTS, MAX_SCRIBE_ROWS } from './sheet-limits';
export { portEventSchema, type PortEvent, type SheetKind } from './sheet-request-fields';

const fields = sheetRequestFields;

export const sheetRequestSchema = z.object(shapeOf(fields)).superRefine((req, ctx) => {
  for (const { path, message } of crossFieldIssues(req, 'mm')) ctx.addIssue({ code: 'custom', path: [path], message });
});

/** What the rules across fields read: a parsed request, or the generator form's values (mm, blanks as NaN). */
type RuleInput = Pick<SheetRequest, 'kind' | 'hubHoleMm' | 'fromDeg' | 'toDeg' | 'stepDeg'> &
  Partial<Pick<SheetRequest, 'diameterMm' | 'innerDiameterMm' | 'outerDiameterMm'>>;

const given = (mm: number | undefined): mm is number => mm !== undefined && Number.isFinite(mm);

/**
 * The rules no single field can check (a diameter the kind needs, inner below
 * outer, hub below disc, a scribe chart's rows), with the lengths written in
 * the unit the user reads: the API speaks mm, the form may show inches.
 */
export function crossFieldIssues(req: RuleInput, unit: LengthUnit): FieldIssue[] {
  const issues: FieldIssue[] = [];
  const length = (mm: number) => `${lengthText(mm, unit)} ${unit}`;
  const need = (field: 'diameterMm' | 'innerDiameterMm' | 'outerDiameterMm') => {
    if (req[field] !== undefined) return;
    const { min, max } = rangeInUnit(DIAMETER_RANGE_MM, unit);
    issues.push({ path: field, message: `${fields[field].label} is required for a ${req.kind} sheet (allowed ${rangeText(min, max, unit)})` });
  };
  if (req.kind === 'wheel' || req.kind === 'strip' || req.kind === 'scribe') need('diameterMm');
  if (req.kind === 'ring') {
    need('innerDiameterMm');
    need('outerDiameterMm');
    if (given(req.innerDiameterMm) && given(req.outerDiameterMm) && req.innerDiameterMm >= req.outerDiameterMm)
      issues.push({
        path: 'innerDiameterMm',
        message: `${fields.innerDiameterMm.label} must be smaller than the outer diameter (${length(req.outerDiameterMm)})`,
      });
  }
  if (req.kind === 'wheel' && given(req.diameterMm) && req.hubHoleMm >= req.diameterMm)
    issues.push({
      path: 'hubHoleMm',
      message: `${fields.hubHoleMm.label} must be smaller than the disc diameter (0 to under ${length(req.diameterMm)})`,
    });
  if (req.kind === 'scribe') {
    if (req.toDeg < req.fromDeg)
      issues.push({ path: 'toDeg', message: `${fields.toDeg.label} must not be below the start (${req.fromDeg}°)` });
    else if ((req.toDeg - req.fromDeg) / req.stepDeg + 1 > MAX_SCRIBE_ROWS)
      issues.push({
        path: 'stepDeg',
        message: `${fields.stepDeg.label} gives more than ${MAX_SCRIBE_ROWS} rows: widen the step or narrow the range`,
      });
  }
  return issues;
}

/** One issue of the schema as the user reads it: `code` is zod's ('too_big', 'custom'…). */
export type CodedIssue = FieldIssue & { code: string };

/**
 * An issue restated in the unit the form shows lengths in: a length field's
 * range message from the field's own range (lengthRangeMessage), a rule across
 * fields from the rule itself. Anything else, and everything in mm, stays as it is.
 */
export function issueInUnit(issue: CodedIssue, req: RuleInput, unit: LengthUnit): string {
  if (unit === 'mm' || !isLengthKey(issue.path)) return issue.message;
  const field = fields[issue.path];
  if (issue.code === 'custom') return crossFieldIssues(req, unit).find((rule) => rule.path === issue.path)?.message ?? issue.message;
  if (issue.code === 'too_small' || issue.code === 'too_big' || issue.code === 'invalid_type')
    return lengthRangeMessage(issue.code, { label: field.label, min: field.min ?? 0, max: field.max ?? 0 }, unit);
  return issue.message;
}

type SheetRequestKey = keyof typeof fields;

/** The fields a form shows in the chosen length unit (the ones measured with calipers). */
export const LENGTH_KEYS: readonly SheetRequestKey[] = fieldsOf(fields)
  .filter((field) => field.kind === 'length')
  .map((field) => field.key as SheetRequestKey);

function isLengthKey(path: string): path is SheetRequestKey {
  return (LENGTH_KEYS as readonly string[]).includes(path);
}

export type SheetRequestInput = z.input<typeof sheetRequestSchema>;
export type SheetRequest = z.output<typeof sheetRequestSchema>;

export type FieldIssue = { path: string; message: string };

/** Flattens zod issues to the API's `{ path, message }` list (`path` joined with dots). */
export function toFieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({ path: issue.path.map(String).join('.') || '(body)', message: issue.message }));
}
