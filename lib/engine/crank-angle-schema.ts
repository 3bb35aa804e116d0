import { z } from 'zod';
import { lengthField } from '../fields/builders';
import { defineFields, shapeOf } from '../fields/field';
import { STROKE_RANGE_MM, checkOffsetCrankGeometry, crankFields } from './calc-fields';
import { deadCentres } from './offset-slider-crank';

/**
 * POST /api/v1/calc/crank-angle and the crank angle form: piston drop below TDC → crank degrees
 * from TDC, after TDC on the down-stroke and before TDC on the up-stroke (equal without pin offset).
 */
export const crankAngleFields = defineFields({
  strokeMm: crankFields.strokeMm,
  rodMm: crankFields.rodMm,
  dropMm: lengthField({ label: 'Piston drop', min: 0, max: STROKE_RANGE_MM.max }),
  pinOffsetMm: crankFields.pinOffsetMm,
});

export const crankAngleSchema = z
  .object(shapeOf(crankAngleFields))
  .superRefine((value, ctx) => {
    if (!checkOffsetCrankGeometry(value, ctx)) return;
    // An offset pin travels a little more than the nominal stroke (offset-slider-crank.ts).
    const pinOffsetMm = value.pinOffsetMm ?? 0;
    const travelMm = pinOffsetMm === 0 ? value.strokeMm : deadCentres({ ...value, pinOffsetMm }).trueStrokeMm;
    if (value.dropMm > travelMm)
      ctx.addIssue({
        code: 'custom',
        path: ['dropMm'],
        message:
          pinOffsetMm === 0
            ? `${crankAngleFields.dropMm.label} must be within the stroke (allowed 0–${value.strokeMm} mm)`
            : `${crankAngleFields.dropMm.label} must be within the stroke with this pin offset (allowed 0–${Number(travelMm.toFixed(3))} mm)`,
      });
  });

export type CrankAngleInput = z.input<typeof crankAngleSchema>;
export type CrankAngleRequest = z.output<typeof crankAngleSchema>;
