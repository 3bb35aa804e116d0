import { z } from 'zod';
import { rangeMessage, type RangeWording } from './range-text';

/**
 * The one range-checked number: every numeric field of every form, API body and
 * query string is built here, so a message always names the field by its label
 * and gives the allowed range in the field's unit.
 */
export function rangedNumber(wording: RangeWording): z.ZodNumber {
  return withRange(z.number({ error: rangeMessage('invalid_type', wording) }), wording);
}

/** The same check on text that should hold a number (a URL's query string): "25" is 25, "x" is not a number. */
export function rangedNumberFromText(wording: RangeWording): z.ZodCoercedNumber<unknown> {
  return withRange(z.coerce.number({ error: rangeMessage('invalid_type', wording) }), wording);
}

function withRange<S extends z.ZodNumber | z.ZodCoercedNumber<unknown>>(base: S, wording: RangeWording): S {
  let schema = base as z.ZodNumber;
  if (wording.whole) schema = schema.int(rangeMessage('not_whole', wording));
  schema = schema.min(wording.min, rangeMessage('too_small', wording));
  if (wording.max !== Number.POSITIVE_INFINITY) schema = schema.max(wording.max, rangeMessage('too_big', wording));
  return schema as S;
}
