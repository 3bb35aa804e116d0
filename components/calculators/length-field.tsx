'use client';

import { useState } from 'react';
import { useController, useFormContext, type FieldPath, type FieldValues } from 'react-hook-form';
import { LabelledField, UnitSuffix, inputClass } from '@/components/generator/fields';
import { lengthText, unitToMm, type LengthUnit } from '@/lib/fields/length';
import { parseTypedNumber } from './length-unit';

type LengthFieldProps<T extends FieldValues> = {
  name: FieldPath<T>;
  label: string;
  unit: LengthUnit;
  help?: React.ReactNode;
  className?: string;
};

/**
 * A length typed in mm or inches and kept in the form in mm, so the shared schema
 * (which speaks mm) checks it. The typed text is kept as typed; it is rewritten only
 * when the unit changes or the value is replaced from outside.
 */
export function LengthField<T extends FieldValues>({ name, label, unit, help, className }: LengthFieldProps<T>) {
  const { control } = useFormContext<T>();
  const { field } = useController({ name, control });
  const valueMm = typeof field.value === 'number' ? field.value : Number.NaN;
  const [shown, setShown] = useState({ unit, valueMm, text: lengthText(valueMm, unit) });
  if (shown.unit !== unit || !Object.is(shown.valueMm, valueMm)) {
    setShown({ unit, valueMm, text: lengthText(valueMm, unit) });
  }

  const onChange = (text: string) => {
    const typed = parseTypedNumber(text);
    const mm = Number.isNaN(typed) ? Number.NaN : unitToMm(typed, unit);
    setShown({ unit, valueMm: mm, text });
    field.onChange(mm);
  };

  return (
    <LabelledField name={name} label={label} help={help} className={className}>
      {(wiring) => (
        <UnitSuffix unit={unit}>
          <input
            {...wiring}
            ref={field.ref}
            name={field.name}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            value={shown.text}
            onChange={(event) => onChange(event.target.value)}
            onBlur={field.onBlur}
            className={`${inputClass} pr-12 font-mono tabular-nums`}
          />
        </UnitSuffix>
      )}
    </LabelledField>
  );
}
