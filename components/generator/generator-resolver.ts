import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldError, FieldErrors, Resolver } from 'react-hook-form';
import { sheetRequestSchema, type SheetRequest } from '@/lib/sheet/sheet-request';
import { firstErrorMessage } from './first-error-message';
import { LENGTH_FIELDS, toSheetRequestInput, type GeneratorFormValues } from './form-values';
import { messageInTypedUnit } from './inch-messages';

const validateRequest = zodResolver(sheetRequestSchema);

/**
 * Validates the form with the shared sheet request schema: the values are first
 * turned into the request (mm, parsed lists), so the messages are exactly the
 * API's. The advance-mark list is one text field, so its per-angle errors are
 * folded into one message on that field. Lengths typed in inches get their
 * range in inches.
 */
export const generatorResolver: Resolver<GeneratorFormValues, unknown, SheetRequest> = async (values, context, options) => {
  const result = await validateRequest(toSheetRequestInput(values), context, options as never);
  const errors = result.errors as FieldErrors<GeneratorFormValues>;
  const marks = errors.advanceMarksDeg;
  if (marks && !marks.message) {
    errors.advanceMarksDeg = { type: 'schema', message: firstErrorMessage(marks) } as FieldError;
  }
  for (const field of LENGTH_FIELDS) {
    const error = errors[field];
    if (error?.message) error.message = messageInTypedUnit({ path: field, code: error.type, message: error.message }, values);
  }
  return Object.keys(errors).length > 0 ? { values: {}, errors } : { values: result.values as SheetRequest, errors: {} };
};
