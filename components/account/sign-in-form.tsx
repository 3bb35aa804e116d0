'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { signIn } from 'next-auth/react';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { signInSchema } from '@/lib/account-forms';
import { signInErrorMessage } from '@/lib/sign-in-messages';
import { FormMessage, InputField, SubmitButton } from './form-controls';

type Values = z.infer<typeof signInSchema>;

export function SignInForm({ callbackUrl, initialError }: { callbackUrl: string; initialError?: string }) {
  const form = useForm<Values>({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });
  const [error, setError] = useState<string | undefined>(signInErrorMessage(initialError));
  const [busy, setBusy] = useState(false);

  const onValid = async (values: Values) => {
    setBusy(true);
    setError(undefined);
    const result = await signIn('credentials', { ...values, redirect: false, callbackUrl });
    setBusy(false);
    if (!result || result.error) {
      setError(signInErrorMessage(result?.error ?? 'CredentialsSignin'));
      return;
    }
    // A full load, so the header's server-rendered account menu sees the new session.
    window.location.assign(callbackUrl);
  };

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={form.handleSubmit(onValid)} aria-label="Sign in" className="max-w-sm space-y-4">
        <InputField<Values> name="email" label="E-mail" type="email" autoComplete="email" />
        <InputField<Values> name="password" label="Password" type="password" autoComplete="current-password" />
        <FormMessage tone="error" message={error} />
        <div className="flex items-center gap-4">
          <SubmitButton busy={busy}>Sign in</SubmitButton>
          <Link href="/reset-password" className="text-sm text-gauge-700 underline dark:text-gauge-300">
            Forgot the password?
          </Link>
        </div>
      </form>
    </FormProvider>
  );
}
