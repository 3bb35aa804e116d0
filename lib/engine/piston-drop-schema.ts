import { z } from 'zod';
import { checkCrankGeometry, numberField, rodField, strokeField } from './calc-fields';

/** POST /api/v1/calc/piston-drop and the piston drop form: crank angle → piston drop below TDC. */
export const pistonDropSchema = z
  .object({
    strokeMm: strokeField(),
    rodMm: rodField(),
    crankDeg: numberField('Crank angle', 'crankDeg', 0, 360, '°'),
    // A wrist-pin offset is not modelled: only a centred pin (0 mm) is accepted.
    pinOffsetMm: z
      .literal(0, { error: 'Wrist-pin offset (pinOffsetMm) is not supported: leave it out or send 0 mm (centred pin)' })
      .optional(),
  })
  .superRefine((value, ctx) => {
    checkCrankGeometry(value, ctx);
  });

export type PistonDropInput = z.input<typeof pistonDropSchema>;
export type PistonDropRequest = z.output<typeof pistonDropSchema>;
