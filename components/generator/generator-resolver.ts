import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldError, FieldErrors, Resolver } from 'react-hook-form';
import { issueInUnit, LENGTH_KEYS, sheetRequestSchema, type SheetRequest } from '@/lib/sheet/sheet-request';
import { firstErrorMessage } from './first-error-message';
import { toSheetRequestInput, type GeneratorFormValues } from './form-values';

const validateRequest = zodResolver(sheetRequestSchema);

/**
 * Validates the form with the shared sheet request schema: the values are first
 * turned into the request (parsed lists, only the kind's fields), so the
 * messages are exactly the API's. The advance-mark list is one text field, so
 * its per-angle errors are folded into one message on that field. A length
 * shown in inches gets its message in inches, from the field's own range.
 */
export const generatorResolver: Resolver<GeneratorFormValues, unknown, SheetRequest> = async (values, context, options) => {
  const result = await validateRequest(toSheetRequestInput(values), context, options as never);
  const errors = result.errors as FieldErrors<GeneratorFormValues>;
  const marks = errors.advanceMarksDeg;
  if (marks && !marks.message) {
    errors.advanceMarksDeg = { type: 'schema', message: firstErrorMessage(marks) } as FieldError;
  }
  for (const field of LENGTH_KEYS) {
    const error = errors[field as keyof GeneratorFormValues] as FieldError | undefined;
    if (error?.message) error.message = issueInUnit({ path: field, code: error.type, message: error.message }, values, values.lengthUnit);
  }
  return Object.keys(errors).length > 0 ? { values: {}, errors } : { values: result.values as SheetRequest, errors: {} };
};
