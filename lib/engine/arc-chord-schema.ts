import { z } from 'zod';
import { lengthField, listField } from '../fields/builders';
import { defineFields, shapeOf } from '../fields/field';
import { DIAMETER_RANGE_MM, MAX_SCRIBE_ROWS } from '../sheet/sheet-request';
import { crankAngleField } from './calc-fields';

/** "16, 18 20" → [16, 18, 20]; a bad entry becomes NaN so its own message names it. Arrays pass through. */
export function anglesFromText(value: unknown): unknown {
  if (typeof value !== 'string') return value;
  return value
    .split(/[\s,;]+/)
    .filter((part) => part !== '')
    .map((part) => (/^[+-]?(\d+\.?\d*|\.\d+)$/.test(part) ? Number(part) : Number.NaN));
}

/** POST /api/v1/calc/arc-chord and the divider distance form. Angles may be a list or comma-separated text. */
export const arcChordFields = defineFields({
  diameterMm: lengthField({ label: 'Diameter', ...DIAMETER_RANGE_MM }),
  anglesDeg: listField(
    { label: 'Angles', unit: '°' },
    z.preprocess(
      anglesFromText,
      z
        .array(crankAngleField('Angle').schema, { error: 'Angles must be a list of angles, each 0–360°' })
        .min(1, `Angles: give 1–${MAX_SCRIBE_ROWS} angles, each 0–360°`)
        .max(MAX_SCRIBE_ROWS, `Angles: at most ${MAX_SCRIBE_ROWS} angles`),
    ),
  ),
});

export const arcChordSchema = z.object(shapeOf(arcChordFields));

export type ArcChordInput = z.input<typeof arcChordSchema>;
export type ArcChordRequest = z.output<typeof arcChordSchema>;
