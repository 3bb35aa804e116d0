'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { resetPasswordSchema } from '@/lib/account-forms';
import { FormMessage, NewPasswordField, SubmitButton } from './form-controls';
import { applyIssues, submitJson } from './submit-json';

type Values = z.infer<typeof resetPasswordSchema>;

export function ResetPasswordForm({ token }: { token: string }) {
  const form = useForm<Values>({ resolver: zodResolver(resetPasswordSchema), defaultValues: { token, password: '' } });
  const [outcome, setOutcome] = useState<{ ok: boolean; message: string } | undefined>();

  const onValid = async (values: Values) => {
    const result = await submitJson('/api/v1/account/password-reset/confirm', 'POST', values);
    setOutcome(
      result.ok
        ? { ok: true, message: 'Your password has been changed. Sign in with the new one.' }
        : { ok: false, message: applyIssues(result, form.setError) },
    );
  };

  if (outcome?.ok) {
    return (
      <div className="space-y-3">
        <FormMessage message={outcome.message} />
        <Link href="/sign-in" className="text-sm font-semibold text-gauge-700 underline dark:text-gauge-300">
          Go to sign-in
        </Link>
      </div>
    );
  }
  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={form.handleSubmit(onValid)} aria-label="Choose a new password" className="max-w-sm space-y-4">
        <NewPasswordField<Values> name="password" label="New password" />
        <FormMessage tone="error" message={outcome?.message} />
        <SubmitButton busy={form.formState.isSubmitting}>Set the new password</SubmitButton>
      </form>
    </FormProvider>
  );
}
