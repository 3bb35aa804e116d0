import { z } from 'zod';
import { PRINTER_SCALE_RANGE } from './sheet/sheet-request';

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

function measuredBar(label: string, field: string) {
  const { min, max } = MEASURED_BAR_RANGE_MM;
  const range = `${min}–${max} mm`;
  return z
    .number({ error: `${label} (${field}) must be a number, ${range}` })
    .min(min, `${label} (${field}) is under ${min} mm (allowed ${range}): ${SCALING_HINT}`)
    .max(max, `${label} (${field}) is over ${max} mm (allowed ${range}): ${SCALING_HINT}`);
}

const profileName = z
  .string({ error: `Profile name (name) must be text, 1–${PROFILE_NAME_MAX} characters` })
  .trim()
  .min(1, `Profile name (name) must not be empty (1–${PROFILE_NAME_MAX} characters)`)
  .max(PROFILE_NAME_MAX, `Profile name (name) must be at most ${PROFILE_NAME_MAX} characters`);

/** What the printer-check form asks for: a name and the two measured bar lengths. */
export const printerMeasurementSchema = z.object({
  name: profileName,
  measuredXMm: measuredBar('Horizontal bar', 'measuredXMm'),
  measuredYMm: measuredBar('Vertical bar', 'measuredYMm'),
});
export type PrinterMeasurement = z.infer<typeof printerMeasurementSchema>;

function scaleFactor(label: string, field: string) {
  const { min, max } = PRINTER_SCALE_RANGE;
  return z
    .number({ error: `${label} (${field}) must be a number, ${min}–${max}` })
    .min(min, `${label} (${field}) must be at least ${min} (allowed ${min}–${max})`)
    .max(max, `${label} (${field}) must be at most ${max} (allowed ${min}–${max})`);
}

/** A stored profile, as kept in the browser (and sent with a sheet request). */
export const printerProfileSchema = z.object({
  id: z.string().min(1).max(64),
  name: profileName,
  printerScaleX: scaleFactor('Printer scale X', 'printerScaleX'),
  printerScaleY: scaleFactor('Printer scale Y', 'printerScaleY'),
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

/** "X 0.98 · Y 1.00" — how a profile is shown next to its name. */
export function describeScale(profile: Pick<PrinterProfile, 'printerScaleX' | 'printerScaleY'>): string {
  return `X ${profile.printerScaleX.toFixed(3)} · Y ${profile.printerScaleY.toFixed(3)}`;
}
