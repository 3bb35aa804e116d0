import { z } from 'zod';
import { numberField } from './calc-fields';
import { STOP_SIDES, WHEEL_NUMBERINGS, crankOrderDeg, signedTurnDeg } from './tdc-from-stops';

const side = (label: string, field: string) =>
  z.enum(STOP_SIDES, { error: `${label} (${field}) must be BTDC or ATDC` }).optional();

/**
 * POST /api/v1/calc/tdc and the TDC form. Full numbering: readings 0–360 in crank
 * order. Split numbering: readings 0–180, each with its side (BTDC or ATDC).
 */
export const tdcSchema = z
  .object({
    numbering: z.enum(WHEEL_NUMBERINGS, { error: 'Numbering (numbering) must be one of: full, split' }),
    readingADeg: numberField('Reading A', 'readingADeg', 0, 360, '°'),
    readingBDeg: numberField('Reading B', 'readingBDeg', 0, 360, '°'),
    readingASide: side('Reading A side', 'readingASide'),
    readingBSide: side('Reading B side', 'readingBSide'),
  })
  .superRefine((value, ctx) => {
    let valid = true;
    if (value.numbering === 'split') {
      for (const [reading, sideField, label] of [
        ['readingADeg', 'readingASide', 'Reading A'],
        ['readingBDeg', 'readingBSide', 'Reading B'],
      ] as const) {
        const degrees = value[reading];
        if (degrees > 180) {
          valid = false;
          ctx.addIssue({
            code: 'custom',
            path: [reading],
            message: `${label} (${reading}) on a split wheel must be at most 180° (allowed 0–180°, with its side BTDC or ATDC)`,
          });
        } else if (degrees > 0 && degrees < 180 && value[sideField] === undefined) {
          valid = false;
          ctx.addIssue({ code: 'custom', path: [sideField], message: `${label} side (${sideField}) is needed on a split wheel: BTDC or ATDC` });
        }
      }
    }
    if (!valid) return;
    const a = crankOrderDeg(value.readingADeg, value.numbering, value.readingASide);
    const b = crankOrderDeg(value.readingBDeg, value.numbering, value.readingBSide);
    if (Math.abs(signedTurnDeg(a, b)) >= 180)
      ctx.addIssue({
        code: 'custom',
        path: ['readingBDeg'],
        message: 'Reading B (readingBDeg) is 180° from reading A: the stops must lie less than 180° apart across TDC',
      });
  });

export type TdcInput = z.input<typeof tdcSchema>;
export type TdcRequest = z.output<typeof tdcSchema>;
