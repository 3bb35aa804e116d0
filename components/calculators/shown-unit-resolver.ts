import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef } from 'react';
import type { FieldError, FieldValues, Resolver } from 'react-hook-form';
import type { z } from 'zod';
import type { Field } from '@/lib/fields/field';
import { lengthRangeMessage, type LengthUnit } from '@/lib/fields/length';

/** What a calculator form tells its resolver (useForm's `context`): the unit its length fields show. */
type ShownUnit = { unit: LengthUnit };

const RANGE_PROBLEMS = new Set(['too_small', 'too_big', 'invalid_type']);

/**
 * Validates with the shared schema (which speaks mm, like the API) and restates
 * a length field's range message in the unit the form shows, from the field's
 * own range in its table: never by rewriting the mm message.
 */
export function shownUnitResolver<S extends z.ZodType<FieldValues, FieldValues>>(
  schema: S,
  fields: Record<string, Field>,
): Resolver<z.input<S>, unknown, z.output<S>> {
  const validate = zodResolver(schema) as unknown as Resolver<z.input<S>, unknown, z.output<S>>;
  return async (values, context, options) => {
    const result = await validate(values, context, options);
    const unit = (context as ShownUnit | undefined)?.unit ?? 'mm';
    if (unit === 'mm') return result;
    for (const [key, error] of Object.entries(result.errors) as Array<[string, FieldError | undefined]>) {
      const field = fields[key];
      if (!error?.message || field?.kind !== 'length' || field.min === undefined || field.max === undefined) continue;
      if (RANGE_PROBLEMS.has(error.type))
        error.message = lengthRangeMessage(error.type as 'too_small', { label: field.label, min: field.min, max: field.max, hint: field.hint }, unit);
    }
    return result;
  };
}

/** Checks the form again when the unit changes, so a message on screen follows the unit (only once a message has shown). */
export function useRecheckOnUnit(form: { formState: { errors: object }; trigger: () => Promise<boolean> }, unit: LengthUnit) {
  const shown = useRef(unit);
  useEffect(() => {
    if (shown.current === unit) return;
    shown.current = unit;
    if (Object.keys(form.formState.errors).length > 0) void form.trigger();
  }, [form, unit]);
}
