import { z } from 'zod';
import { defineFields, shapeOf } from '../fields/field';
import { checkOffsetCrankGeometry, crankAngleField, crankFields } from './calc-fields';

/**
 * POST /api/v1/calc/piston-drop and the piston drop form: crank angle → piston drop below TDC.
 * crankDeg is 0–360 in crank order from piston TDC: x° ATDC is x, x° BTDC is 360 − x. With a
 * wrist-pin offset the two sides of TDC differ, so the side matters.
 */
export const pistonDropFields = defineFields({
  strokeMm: crankFields.strokeMm,
  rodMm: crankFields.rodMm,
  crankDeg: crankAngleField('Crank angle'),
  pinOffsetMm: crankFields.pinOffsetMm,
});

export const pistonDropSchema = z
  .object(shapeOf(pistonDropFields))
  .superRefine((value, ctx) => {
    checkOffsetCrankGeometry(value, ctx);
  });

export type PistonDropInput = z.input<typeof pistonDropSchema>;
export type PistonDropRequest = z.output<typeof pistonDropSchema>;
