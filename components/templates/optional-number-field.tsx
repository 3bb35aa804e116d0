'use client';

import { useFormContext, type FieldPath, type FieldValues } from 'react-hook-form';
import { FieldErrorText, HelpText, fieldId, inputClass, useFieldError } from '@/components/generator/fields';

/** Blank means "not known" (null); anything else must be a number, so bad text reaches the schema as NaN. */
export const blankAsNull = (value: unknown) => (value === '' || value === null || value === undefined ? null : Number(value));

/** "16, 18 ,20" → [16, 18, 20]; bad entries become NaN for the schema to name. */
export const commaListAsNumbers = (value: unknown) =>
  Array.isArray(value)
    ? value
    : String(value ?? '')
        .split(',')
        .map((s) => s.trim())
        .filter(Boolean)
        .map(Number);

type Props<T extends FieldValues> = { name: FieldPath<T>; label: string; unit?: string; help?: string };

export function OptionalNumberField<T extends FieldValues>({ name, label, unit, help }: Props<T>) {
  const { register } = useFormContext<T>();
  const error = useFieldError(name);
  const id = fieldId(name);
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium text-steel-800 dark:text-steel-200">
        {label}
        {unit ? <span className="font-normal text-steel-500"> ({unit})</span> : null}
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-help ${id}-error`}
        className={`${inputClass} font-mono tabular-nums`}
        {...register(name, { setValueAs: blankAsNull })}
      />
      <HelpText id={`${id}-help`}>{help}</HelpText>
      <FieldErrorText id={`${id}-error`} message={error} />
    </div>
  );
}
