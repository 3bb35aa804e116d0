'use client';

import { useFormContext, type FieldPath, type FieldValues } from 'react-hook-form';
import { LabelledField, inputClass } from '@/components/generator/fields';

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
  return (
    <LabelledField name={name} label={<>{label}{unit ? <span className="font-normal text-steel-500"> ({unit})</span> : null}</>} help={help}>
      {(wiring) => (
        <input
          {...wiring}
          type="text"
          inputMode="decimal"
          className={`${inputClass} font-mono tabular-nums`}
          {...register(name, { setValueAs: blankAsNull })}
        />
      )}
    </LabelledField>
  );
}
