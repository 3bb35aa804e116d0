import { z } from 'zod';
import { DIAMETER_RANGE_MM, MAX_SCRIBE_ROWS } from '../sheet/sheet-request';
import { numberField } from './calc-fields';

/** "16, 18 20" → [16, 18, 20]; a bad entry becomes NaN so its own message names it. Arrays pass through. */
export function anglesFromText(value: unknown): unknown {
  if (typeof value !== 'string') return value;
  return value
    .split(/[\s,;]+/)
    .filter((part) => part !== '')
    .map((part) => (/^[+-]?(\d+\.?\d*|\.\d+)$/.test(part) ? Number(part) : Number.NaN));
}

/** POST /api/v1/calc/arc-chord and the divider distance form. Angles may be a list or comma-separated text. */
export const arcChordSchema = z.object({
  diameterMm: numberField('Diameter', 'diameterMm', DIAMETER_RANGE_MM.min, DIAMETER_RANGE_MM.max, 'mm'),
  anglesDeg: z.preprocess(
    anglesFromText,
    z
      .array(numberField('Angle', 'anglesDeg', 0, 360, '°'), { error: 'Angles (anglesDeg) must be a list of angles, each 0–360°' })
      .min(1, `Angles (anglesDeg): give 1–${MAX_SCRIBE_ROWS} angles, each 0–360°`)
      .max(MAX_SCRIBE_ROWS, `Angles (anglesDeg): at most ${MAX_SCRIBE_ROWS} angles`),
  ),
});

export type ArcChordInput = z.input<typeof arcChordSchema>;
export type ArcChordRequest = z.output<typeof arcChordSchema>;
