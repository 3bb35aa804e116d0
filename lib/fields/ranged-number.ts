import { z } from 'zod';
import { rangeMessage, type RangeWording } from './range-text';

/**
 * The one range-checked number: every numeric field of every form and API is
 * built here, so a message always names the field by its label and gives the
 * allowed range in the field's unit.
 */
export function rangedNumber(wording: RangeWording): z.ZodNumber {
  return z
    .number({ error: rangeMessage('invalid_type', wording) })
    .min(wording.min, rangeMessage('too_small', wording))
    .max(wording.max, rangeMessage('too_big', wording));
}
