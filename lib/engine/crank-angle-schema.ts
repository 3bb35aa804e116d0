import { z } from 'zod';
import { STROKE_RANGE_MM, checkCrankGeometry, numberField, rodField, strokeField, strokeInRange } from './calc-fields';

/** POST /api/v1/calc/crank-angle and the crank angle form: piston drop below TDC → crank degrees from TDC. */
export const crankAngleSchema = z
  .object({
    strokeMm: strokeField(),
    rodMm: rodField(),
    dropMm: numberField('Piston drop', 'dropMm', 0, STROKE_RANGE_MM.max, 'mm'),
  })
  .superRefine((value, ctx) => {
    checkCrankGeometry(value, ctx);
    if (strokeInRange(value.strokeMm) && value.dropMm > value.strokeMm)
      ctx.addIssue({
        code: 'custom',
        path: ['dropMm'],
        message: `Piston drop (dropMm) must be within the stroke (allowed 0–${value.strokeMm} mm)`,
      });
  });

export type CrankAngleInput = z.input<typeof crankAngleSchema>;
export type CrankAngleRequest = z.output<typeof crankAngleSchema>;
