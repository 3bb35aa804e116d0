'use client';

import { useFormContext, type FieldPath, type FieldValues } from 'react-hook-form';
import { LabelledField, inputClass } from '@/components/generator/fields';
import { PASSWORD_LENGTH } from '@/lib/account-forms';

type InputFieldProps<T extends FieldValues> = {
  name: FieldPath<T>;
  label: string;
  type?: 'text' | 'email' | 'password';
  autoComplete?: string;
  help?: React.ReactNode;
};

/** A labelled text, e-mail or password input with help and a live error line. */
export function InputField<T extends FieldValues>({ name, label, type = 'text', autoComplete, help }: InputFieldProps<T>) {
  const { register } = useFormContext<T>();
  return (
    <LabelledField name={name} label={label} help={help}>
      {(wiring) => <input {...wiring} type={type} autoComplete={autoComplete} className={inputClass} {...register(name)} />}
    </LabelledField>
  );
}

/** The field where a new password is chosen (sign-up, reset), stating the rule the schema checks. */
export function NewPasswordField<T extends FieldValues>({ name, label }: { name: FieldPath<T>; label: string }) {
  return <InputField<T> name={name} label={label} type="password" autoComplete="new-password" help={`At least ${PASSWORD_LENGTH.min} characters.`} />;
}

export function SubmitButton({ children, busy }: { children: React.ReactNode; busy?: boolean }) {
  return (
    <button
      type="submit"
      disabled={busy}
      className="rounded-md bg-gauge-600 px-4 py-2 text-sm font-semibold text-white shadow-sm hover:bg-gauge-700 disabled:opacity-60"
    >
      {children}
    </button>
  );
}

/** The form-wide outcome line, read out when it changes. */
export function FormMessage({ message, tone = 'info' }: { message?: string; tone?: 'info' | 'error' }) {
  return (
    <p
      role={tone === 'error' ? 'alert' : 'status'}
      aria-live="polite"
      className={`text-sm empty:hidden ${tone === 'error' ? 'font-medium text-red-700 dark:text-red-400' : 'text-steel-700 dark:text-steel-200'}`}
    >
      {message ?? ''}
    </p>
  );
}
