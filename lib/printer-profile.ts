import { z } from 'zod';
import { lengthField, textField } from './fields/builders';
import { defineFields, shapeOf } from './fields/field';
import { printerScaleFields } from './sheet/sheet-request-fields';

export { describeScale } from './printer-scale-text';

/**
 * Printer profiles: the scale-check sheet carries 100 mm bars in both axes
 * (DEVELOPERS.md, "Sheets"). The user measures what the printer made of them; the profile
 * holds what the printer makes of one millimetre (measured ÷ 100) per axis, and
 * later sheets are pre-scaled by its inverse.
 */

export const CHECK_BAR_MM = 100;
/**
 * A bar outside this range was not printed at actual size: no correction can be
 * trusted. The same limits as the schema's printer scale (0.9–1.1) times 100 mm.
 */
export const MEASURED_BAR_RANGE_MM = { min: 90, max: 110 } as const;
export const PROFILE_NAME_MAX = 60;

const SCALING_HINT =
  'the printer is probably scaling to fit the page: print again at 100 % / actual size with fit-to-page turned off';

/** What the printer-check form asks for: a name and the two measured bar lengths. */
export const printerMeasurementFields = defineFields({
  name: textField({ label: 'Profile name', minLength: 1, maxLength: PROFILE_NAME_MAX }),
  measuredXMm: lengthField({ label: 'Horizontal bar', ...MEASURED_BAR_RANGE_MM, hint: SCALING_HINT, help: 'The 100 mm bar that runs across the page.' }),
  measuredYMm: lengthField({ label: 'Vertical bar', ...MEASURED_BAR_RANGE_MM, hint: SCALING_HINT, help: 'The 100 mm bar that runs down the page.' }),
});

export const printerMeasurementSchema = z.object(shapeOf(printerMeasurementFields));
export type PrinterMeasurement = z.infer<typeof printerMeasurementSchema>;

/** A stored profile, as kept in the browser (and sent with a sheet request); id and date are the browser's bookkeeping. */
export const printerProfileSchema = z.object({
  id: z.string().min(1).max(64),
  name: printerMeasurementFields.name.schema,
  ...shapeOf(printerScaleFields),
  createdAt: z.string().max(40),
});
export type PrinterProfile = z.infer<typeof printerProfileSchema>;

/** Printed length ÷ true length, kept to 5 decimals (a steel rule reads 0.5 mm at best). */
export function scaleFromMeasuredMm(measuredMm: number): number {
  return Math.round((measuredMm / CHECK_BAR_MM) * 1e5) / 1e5;
}

type ProfileResult =
  | { ok: true; profile: Omit<PrinterProfile, 'id' | 'createdAt'> }
  | { ok: false; issues: { path: string; message: string }[] };

/** Validates a measurement and turns it into scale factors, or names what is wrong. */
export function profileFromMeasurement(input: unknown): ProfileResult {
  const parsed = printerMeasurementSchema.safeParse(input);
  if (!parsed.success)
    return {
      ok: false,
      issues: parsed.error.issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message })),
    };
  const { name, measuredXMm, measuredYMm } = parsed.data;
  return {
    ok: true,
    profile: { name, printerScaleX: scaleFromMeasuredMm(measuredXMm), printerScaleY: scaleFromMeasuredMm(measuredYMm) },
  };
}
