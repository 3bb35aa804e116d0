import { z } from 'zod';
import { choiceField } from '../fields/builders';
import { defineFields, shapeOf } from '../fields/field';
import { crankAngleField } from './calc-fields';
import { STOP_SIDES, WHEEL_NUMBERINGS, crankOrderDeg, signedTurnDeg } from './tdc-from-stops';

const side = (label: string) => choiceField({ label, choices: STOP_SIDES }).optional();

export const tdcFields = defineFields({
  numbering: choiceField({ label: 'Numbering', choices: WHEEL_NUMBERINGS }),
  readingADeg: crankAngleField('Reading A'),
  readingBDeg: crankAngleField('Reading B'),
  readingASide: side('Reading A side'),
  readingBSide: side('Reading B side'),
});

/**
 * POST /api/v1/calc/tdc and the TDC form. Full numbering: readings 0–360 in crank
 * order. Split numbering: readings 0–180, each with its side (BTDC or ATDC).
 */
export const tdcSchema = z
  .object(shapeOf(tdcFields))
  .superRefine((value, ctx) => {
    let valid = true;
    if (value.numbering === 'split') {
      for (const [reading, sideField] of [
        ['readingADeg', 'readingASide'],
        ['readingBDeg', 'readingBSide'],
      ] as const) {
        const { label } = tdcFields[reading];
        const degrees = value[reading];
        if (degrees > 180) {
          valid = false;
          ctx.addIssue({
            code: 'custom',
            path: [reading],
            message: `${label} on a split wheel must be at most 180° (allowed 0–180°, with its side BTDC or ATDC)`,
          });
        } else if (degrees > 0 && degrees < 180 && value[sideField] === undefined) {
          valid = false;
          ctx.addIssue({ code: 'custom', path: [sideField], message: `${tdcFields[sideField].label} is needed on a split wheel: BTDC or ATDC` });
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
        message: 'Reading B is 180° from reading A: the stops must lie less than 180° apart across TDC',
      });
  });

export type TdcInput = z.input<typeof tdcSchema>;
export type TdcRequest = z.output<typeof tdcSchema>;
