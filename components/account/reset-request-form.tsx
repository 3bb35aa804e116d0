'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { emailOnlySchema } from '@/lib/account-forms';
import { FormMessage, InputField, SubmitButton } from './form-controls';
import { applyIssues, submitJson } from './submit-json';

type Values = z.infer<typeof emailOnlySchema>;

export function ResetRequestForm() {
  const form = useForm<Values>({ resolver: zodResolver(emailOnlySchema), defaultValues: { email: '' } });
  const [outcome, setOutcome] = useState<{ tone: 'info' | 'error'; message: string } | undefined>();

  const onValid = async (values: Values) => {
    const result = await submitJson('/api/v1/account/password-reset', 'POST', values);
    setOutcome(
      result.ok
        ? { tone: 'info', message: String(result.body.message) }
        : { tone: 'error', message: applyIssues(result, form.setError) },
    );
  };

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={form.handleSubmit(onValid)} aria-label="Ask for a reset link" className="max-w-sm space-y-4">
        <InputField<Values> name="email" label="E-mail" type="email" autoComplete="email" />
        <FormMessage tone={outcome?.tone} message={outcome?.message} />
        <SubmitButton busy={form.formState.isSubmitting}>Send the link</SubmitButton>
      </form>
    </FormProvider>
  );
}
