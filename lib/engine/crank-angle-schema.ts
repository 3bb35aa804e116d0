import { z } from 'zod';
import { STROKE_RANGE_MM, checkOffsetCrankGeometry, numberField, pinOffsetField, rodField, strokeField } from './calc-fields';
import { deadCentres } from './offset-slider-crank';

/**
 * POST /api/v1/calc/crank-angle and the crank angle form: piston drop below TDC → crank degrees
 * from TDC, after TDC on the down-stroke and before TDC on the up-stroke (equal without pin offset).
 */
export const crankAngleSchema = z
  .object({
    strokeMm: strokeField(),
    rodMm: rodField(),
    dropMm: numberField('Piston drop', 'dropMm', 0, STROKE_RANGE_MM.max, 'mm'),
    pinOffsetMm: pinOffsetField(),
  })
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
            ? `Piston drop (dropMm) must be within the stroke (allowed 0–${value.strokeMm} mm)`
            : `Piston drop (dropMm) must be within the stroke with this pin offset (allowed 0–${Number(travelMm.toFixed(3))} mm)`,
      });
  });

export type CrankAngleInput = z.input<typeof crankAngleSchema>;
export type CrankAngleRequest = z.output<typeof crankAngleSchema>;
