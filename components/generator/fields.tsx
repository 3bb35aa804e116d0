'use client';

import { get, useFormContext, useFormState, type FieldPath, type FieldValues } from 'react-hook-form';
import { firstErrorMessage } from './first-error-message';

/** Form controls shared by the generator and the printer check: label, help and a live error line. */

export function fieldId(name: string): string {
  return `field-${name.replace(/[^a-zA-Z0-9]+/g, '-')}`;
}

export const inputClass =
  'block min-h-11 w-full rounded-md border border-steel-300 bg-white px-3 py-2 text-sm text-steel-900 shadow-inner shadow-steel-100 ' +
  'focus:border-gauge-500 focus:outline-none focus:ring-2 focus:ring-gauge-500/30 aria-[invalid=true]:border-red-600 ' +
  'dark:border-steel-600 dark:bg-steel-900 dark:text-steel-100 dark:shadow-none';

export function useFieldError(name: string): string | undefined {
  const { errors } = useFormState({ name: name as never });
  return firstErrorMessage(get(errors, name));
}

/** The error line is always in the DOM so screen readers hear it appear (aria-live). */
export function FieldErrorText({ id, message }: { id: string; message?: string }) {
  return (
    <p id={id} aria-live="polite" className="min-h-0 text-xs font-medium text-red-700 empty:hidden dark:text-red-400">
      {message ?? ''}
    </p>
  );
}

export function HelpText({ id, children }: { id: string; children?: React.ReactNode }) {
  if (!children) return null;
  return (
    <p id={id} className="text-xs leading-relaxed text-steel-500 dark:text-steel-400">
      {children}
    </p>
  );
}

/** The attributes that tie a control to its label, help line and error line. */
export type FieldWiring = {
  id: string;
  'aria-invalid': true | undefined;
  'aria-describedby': string;
};

type LabelledFieldProps = {
  name: string;
  label: React.ReactNode;
  help?: React.ReactNode;
  className?: string;
  /** Renders the one control, spreading `wiring` onto it. */
  children: (wiring: FieldWiring) => React.ReactNode;
};

/** A label above one control, then its help and its live error line, all wired by id and aria-describedby. */
export function LabelledField({ name, label, help, className, children }: LabelledFieldProps) {
  const error = useFieldError(name);
  const id = fieldId(name);
  return (
    <div className={`space-y-1 ${className ?? ''}`}>
      <label htmlFor={id} className="block text-sm font-medium text-steel-800 dark:text-steel-200">
        {label}
      </label>
      {children({ id, 'aria-invalid': error ? true : undefined, 'aria-describedby': `${id}-help ${id}-error` })}
      <HelpText id={`${id}-help`}>{help}</HelpText>
      <FieldErrorText id={`${id}-error`} message={error} />
    </div>
  );
}

type NumberFieldProps<T extends FieldValues> = {
  name: FieldPath<T>;
  label: string;
  unit?: string;
  help?: React.ReactNode;
  step?: number | 'any';
  min?: number;
  placeholder?: string;
  className?: string;
};

/** A number input read with valueAsNumber: blank or bad text reaches the schema as NaN and gets its message. */
export function NumberField<T extends FieldValues>({ name, label, unit, help, step = 'any', min, placeholder, className }: NumberFieldProps<T>) {
  const { register } = useFormContext<T>();
  return (
    <LabelledField name={name} label={label} help={help} className={className}>
      {(wiring) => (
        <UnitSuffix unit={unit}>
          <input
            {...wiring}
            type="number"
            inputMode="decimal"
            step={step}
            min={min}
            placeholder={placeholder}
            className={`${inputClass} font-mono tabular-nums ${unit ? 'pr-12' : ''}`}
            {...register(name, { valueAsNumber: true })}
          />
        </UnitSuffix>
      )}
    </LabelledField>
  );
}

type TextFieldProps<T extends FieldValues> = {
  name: FieldPath<T>;
  label: string;
  help?: React.ReactNode;
  placeholder?: string;
  maxLength?: number;
  className?: string;
  mono?: boolean;
};

export function TextField<T extends FieldValues>({ name, label, help, placeholder, maxLength, className, mono }: TextFieldProps<T>) {
  const { register } = useFormContext<T>();
  return (
    <LabelledField name={name} label={label} help={help} className={className}>
      {(wiring) => (
        <input
          {...wiring}
          type="text"
          placeholder={placeholder}
          maxLength={maxLength}
          className={`${inputClass} ${mono ? 'font-mono' : ''}`}
          {...register(name)}
        />
      )}
    </LabelledField>
  );
}

type SelectFieldProps<T extends FieldValues> = {
  name: FieldPath<T>;
  label: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  help?: React.ReactNode;
  className?: string;
};

export function SelectField<T extends FieldValues>({ name, label, options, help, className }: SelectFieldProps<T>) {
  const { register } = useFormContext<T>();
  return (
    <LabelledField name={name} label={label} help={help} className={className}>
      {(wiring) => (
        <select {...wiring} className={inputClass} {...register(name)}>
          {options.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      )}
    </LabelledField>
  );
}

type ChoiceGroupProps<T extends FieldValues> = {
  name: FieldPath<T>;
  legend: string;
  options: ReadonlyArray<{ value: string; label: string; hint?: string }>;
  help?: React.ReactNode;
  columns?: 2 | 3;
};

/** Radio buttons styled as segments; arrow keys move between them (native radio behaviour). */
export function ChoiceGroup<T extends FieldValues>({ name, legend, options, help, columns = 2 }: ChoiceGroupProps<T>) {
  const { register } = useFormContext<T>();
  const error = useFieldError(name);
  const id = fieldId(name);
  return (
    <fieldset className="space-y-1" aria-describedby={`${id}-help ${id}-error`}>
      <legend className="mb-1 block text-sm font-medium text-steel-800 dark:text-steel-200">{legend}</legend>
      <div className={`grid gap-2 ${columns === 3 ? 'sm:grid-cols-3' : 'sm:grid-cols-2'}`}>
        {options.map((option) => (
          <label
            key={option.value}
            className="flex cursor-pointer items-start gap-2 rounded-md border border-steel-200 bg-white px-3 py-2 text-sm transition-colors hover:border-steel-400 has-[:checked]:border-gauge-600 has-[:checked]:bg-gauge-500/5 has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-gauge-500/40 dark:border-steel-700 dark:bg-steel-900"
          >
            <input type="radio" value={option.value} className="mt-0.5 accent-gauge-600" {...register(name)} />
            <span>
              <span className="block font-medium text-steel-900 dark:text-steel-100">{option.label}</span>
              {option.hint ? <span className="block text-xs text-steel-500 dark:text-steel-400">{option.hint}</span> : null}
            </span>
          </label>
        ))}
      </div>
      <HelpText id={`${id}-help`}>{help}</HelpText>
      <FieldErrorText id={`${id}-error`} message={error} />
    </fieldset>
  );
}

type CheckboxFieldProps<T extends FieldValues> = {
  name: FieldPath<T>;
  label: string;
  hint?: string;
  help?: React.ReactNode;
};

/** One yes/no option: the box and its label on one line, a hint under the label, then help and the live error line. */
export function CheckboxField<T extends FieldValues>({ name, label, hint, help }: CheckboxFieldProps<T>) {
  const { register } = useFormContext<T>();
  const error = useFieldError(name);
  const id = fieldId(name);
  return (
    <div className="space-y-1">
      <label
        htmlFor={id}
        className="flex cursor-pointer items-start gap-2 rounded-md border border-steel-200 bg-white px-3 py-2 text-sm transition-colors hover:border-steel-400 has-[:checked]:border-gauge-600 has-[:checked]:bg-gauge-500/5 has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-gauge-500/40 dark:border-steel-700 dark:bg-steel-900"
      >
        <input
          id={id}
          type="checkbox"
          aria-invalid={error ? true : undefined}
          aria-describedby={`${id}-help ${id}-error`}
          className="mt-0.5 size-4 accent-gauge-600"
          {...register(name)}
        />
        <span>
          <span className="block font-medium text-steel-900 dark:text-steel-100">{label}</span>
          {hint ? <span className="block text-xs text-steel-500 dark:text-steel-400">{hint}</span> : null}
        </span>
      </label>
      <HelpText id={`${id}-help`}>{help}</HelpText>
      <FieldErrorText id={`${id}-error`} message={error} />
    </div>
  );
}

/** A unit shown inside the right end of its input (the input leaves room with pr-12). */
export function UnitSuffix({ unit, children }: { unit?: string; children: React.ReactNode }) {
  return (
    <div className="relative">
      {children}
      {unit ? (
        <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center font-mono text-xs text-steel-500">{unit}</span>
      ) : null}
    </div>
  );
}

/** A titled group of fields in the form. */
export function FormSection({ title, children, aside }: { title: string; children: React.ReactNode; aside?: React.ReactNode }) {
  return (
    <section className="rounded-lg border border-steel-200 bg-white/70 p-4 dark:border-steel-800 dark:bg-steel-900/60">
      <div className="mb-3 flex items-baseline justify-between gap-2 border-b border-dashed border-steel-200 pb-2 dark:border-steel-700">
        <h2 className="text-xs font-bold uppercase tracking-[0.14em] text-steel-600 dark:text-steel-300">{title}</h2>
        {aside}
      </div>
      <div className="space-y-4">{children}</div>
    </section>
  );
}
