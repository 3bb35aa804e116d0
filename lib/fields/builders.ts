import { z } from 'zod';
import { Field, type FieldOptions } from './field';
import { rangedNumber, rangedNumberFromText } from './ranged-number';

/** Builders for each kind of field; each returns a required field, made optional/nullable/defaulted by its methods. */

type Range = { min: number; max: number };

/** A number in a unit that does not change with the user's choice (degrees, a scale factor, a count). */
export function numberField(options: FieldOptions & Range & { unit?: string }): Field<z.ZodNumber> {
  const unit = options.unit ?? '';
  return new Field(
    { ...options, kind: 'number', unit, required: true },
    rangedNumber({ label: options.label, min: options.min, max: options.max, unit, hint: options.hint }),
  );
}

/** A whole number read from a URL's query string (a page, a page size, an id); no `max` means no upper limit. */
export function queryNumberField(options: FieldOptions & { min: number; max?: number }): Field<z.ZodCoercedNumber<unknown>> {
  const max = options.max ?? Number.POSITIVE_INFINITY;
  return new Field(
    { ...options, kind: 'number', unit: '', required: true, max },
    rangedNumberFromText({ label: options.label, min: options.min, max, unit: '', hint: options.hint, whole: true }),
  );
}

/** A length, held in mm; a form may show it in inches (see length.ts). */
export function lengthField(options: FieldOptions & Range): Field<z.ZodNumber> {
  return new Field(
    { ...options, kind: 'length', unit: 'mm', required: true },
    rangedNumber({ label: options.label, min: options.min, max: options.max, unit: 'mm', hint: options.hint }),
  );
}

/** Text, trimmed; `minLength` 1 makes it non-empty. */
export function textField(options: FieldOptions & { maxLength: number; minLength?: number }): Field<z.ZodString> {
  const { label, maxLength, minLength = 0 } = options;
  const size = minLength > 0 ? `${minLength}–${maxLength} characters` : `up to ${maxLength} characters`;
  let schema = z.string({ error: `${label} must be text, ${size}` }).trim();
  if (minLength > 0)
    schema = schema.min(minLength, minLength === 1 ? `${label} must not be empty (${size})` : `${label} must be at least ${minLength} characters`);
  schema = schema.max(maxLength, `${label} must be at most ${maxLength} characters`);
  return new Field({ ...options, kind: 'text', unit: '', required: minLength > 0, minLength, maxLength }, schema);
}

/** One of a fixed list of values. */
export function choiceField<const C extends readonly [string, ...string[]]>(
  options: FieldOptions & { choices: C },
): Field<z.ZodEnum<{ [V in C[number]]: V }>> {
  const { label, choices } = options;
  return new Field(
    { ...options, kind: 'choice', unit: '', required: true },
    z.enum(choices, { error: `${label} must be one of: ${choices.join(', ')}` }) as z.ZodEnum<{ [V in C[number]]: V }>,
  );
}

/** Yes or no. */
export function flagField(options: FieldOptions): Field<z.ZodBoolean> {
  return new Field({ ...options, kind: 'flag', unit: '', required: true }, z.boolean({ error: `${options.label} must be true or false` }));
}

/** A list or a pair (advance marks, port events, a window): the schema is written out, the facts are declared here. */
export function listField<S extends z.ZodType>(options: FieldOptions & { unit?: string }, schema: S): Field<S> {
  return new Field({ ...options, kind: 'list', unit: options.unit ?? '', required: true }, schema);
}
