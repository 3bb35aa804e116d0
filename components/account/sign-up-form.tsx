'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { signIn } from 'next-auth/react';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { signUpSchema } from '@/lib/account-forms';
import { FormMessage, InputField, NewPasswordField, SubmitButton } from './form-controls';
import { applyIssues, submitJson } from './submit-json';

type Values = z.input<typeof signUpSchema>;

export function SignUpForm({ callbackUrl, invitationToken, email }: { callbackUrl: string; invitationToken?: string; email?: string }) {
  const form = useForm<Values>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: '', email: email ?? '', password: '', invitationToken },
  });
  const [error, setError] = useState<string | undefined>();
  const [busy, setBusy] = useState(false);

  const onValid = async (values: Values) => {
    setBusy(true);
    setError(undefined);
    const result = await submitJson('/api/v1/account/sign-up', 'POST', values);
    if (!result.ok) {
      setBusy(false);
      setError(applyIssues(result, form.setError));
      return;
    }
    const signedIn = await signIn('credentials', { email: values.email, password: values.password, redirect: false });
    setBusy(false);
    if (signedIn?.error) setError('The account was created, but signing in failed: try the sign-in page.');
    else window.location.assign(callbackUrl);
  };

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={form.handleSubmit(onValid)} aria-label="Create an account" className="max-w-sm space-y-4">
        <InputField<Values> name="name" label="Your name" autoComplete="name" />
        <InputField<Values> name="email" label="E-mail" type="email" autoComplete="email" />
        <NewPasswordField<Values> name="password" label="Password" />
        <FormMessage tone="error" message={error} />
        <SubmitButton busy={busy}>Create account</SubmitButton>
      </form>
    </FormProvider>
  );
}
