import { z } from 'zod';
import { shapeOf } from '../fields/field';
import { rangeText } from '../fields/range-text';
import { DIAMETER_RANGE_MM, MAX_SCRIBE_ROWS, sheetRequestFields } from './sheet-request-fields';

/**
 * The one schema for a sheet request: the generator form (browser), the preview
 * server action and POST /api/v1/sheets all validate with it, derived from the
 * field table (sheet-request-fields.ts) plus the rules across fields. Lengths in
 * mm, angles in degrees. Every message names the field by its label and its allowed range.
 */

export {
  ADVANCE_RANGE_DEG,
  DIAMETER_RANGE_MM,
  MAX_ADVANCE_MARKS,
  MAX_PORT_EVENTS,
  MAX_SCRIBE_ROWS,
  STRIP_WIDTH_RANGE_MM,
  portEventSchema,
  type PortEvent,
  type SheetKind,
} from './sheet-request-fields';

const fields = sheetRequestFields;

/** "is required for a wheel sheet (allowed 20–600 mm)": the diameter's own range. */
const requiredRange = `allowed ${rangeText(DIAMETER_RANGE_MM.min, DIAMETER_RANGE_MM.max, 'mm')}`;

export const sheetRequestSchema = z
  .object(shapeOf(fields))
  .superRefine((req, ctx) => {
    const need = (field: 'diameterMm' | 'innerDiameterMm' | 'outerDiameterMm') => {
      if (req[field] === undefined)
        ctx.addIssue({ code: 'custom', path: [field], message: `${fields[field].label} is required for a ${req.kind} sheet (${requiredRange})` });
    };
    if (req.kind === 'wheel' || req.kind === 'strip' || req.kind === 'scribe') need('diameterMm');
    if (req.kind === 'ring') {
      need('innerDiameterMm');
      need('outerDiameterMm');
      if (req.innerDiameterMm !== undefined && req.outerDiameterMm !== undefined && req.innerDiameterMm >= req.outerDiameterMm)
        ctx.addIssue({
          code: 'custom',
          path: ['innerDiameterMm'],
          message: `Inner diameter must be smaller than the outer diameter (${req.outerDiameterMm} mm)`,
        });
    }
    if (req.kind === 'wheel' && req.diameterMm !== undefined && req.hubHoleMm >= req.diameterMm)
      ctx.addIssue({
        code: 'custom',
        path: ['hubHoleMm'],
        message: `Hub hole must be smaller than the disc diameter (0 to under ${req.diameterMm} mm)`,
      });
    if (req.kind === 'scribe') {
      if (req.toDeg < req.fromDeg)
        ctx.addIssue({ code: 'custom', path: ['toDeg'], message: `Scribe chart end must not be below the start (${req.fromDeg}°)` });
      else if ((req.toDeg - req.fromDeg) / req.stepDeg + 1 > MAX_SCRIBE_ROWS)
        ctx.addIssue({
          code: 'custom',
          path: ['stepDeg'],
          message: `Scribe chart step gives more than ${MAX_SCRIBE_ROWS} rows: widen the step or narrow the range`,
        });
    }
  });

export type SheetRequestInput = z.input<typeof sheetRequestSchema>;
export type SheetRequest = z.output<typeof sheetRequestSchema>;

export type FieldIssue = { path: string; message: string };

/** Flattens zod issues to the API's `{ path, message }` list (`path` joined with dots). */
export function toFieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({ path: issue.path.map(String).join('.') || '(body)', message: issue.message }));
}
