import { z } from 'zod';
import { checkOffsetCrankGeometry, numberField, pinOffsetField, rodField, strokeField } from './calc-fields';

/**
 * POST /api/v1/calc/piston-drop and the piston drop form: crank angle → piston drop below TDC.
 * crankDeg is 0–360 in crank order from piston TDC: x° ATDC is x, x° BTDC is 360 − x. With a
 * wrist-pin offset the two sides of TDC differ, so the side matters.
 */
export const pistonDropSchema = z
  .object({
    strokeMm: strokeField(),
    rodMm: rodField(),
    crankDeg: numberField('Crank angle', 'crankDeg', 0, 360, '°'),
    pinOffsetMm: pinOffsetField(),
  })
  .superRefine((value, ctx) => {
    checkOffsetCrankGeometry(value, ctx);
  });

export type PistonDropInput = z.input<typeof pistonDropSchema>;
export type PistonDropRequest = z.output<typeof pistonDropSchema>;
