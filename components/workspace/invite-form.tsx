'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormMessage, InputField, SubmitButton } from '@/components/account/form-controls';
import { applyIssues, submitJson } from '@/components/account/submit-json';
import { SelectField } from '@/components/generator/fields';
import { inviteSchema } from '@/lib/account-forms';
import { DEFAULT_INVITE_ROLE, ROLE_OPTIONS } from '@/lib/access-policy';

type Values = z.infer<typeof inviteSchema>;

export function InviteForm({ slug }: { slug: string }) {
  const router = useRouter();
  const form = useForm<Values>({ resolver: zodResolver(inviteSchema), defaultValues: { email: '', role: DEFAULT_INVITE_ROLE } });
  const [outcome, setOutcome] = useState<{ tone: 'info' | 'error'; message: string } | undefined>();

  const onValid = async (values: Values) => {
    const result = await submitJson(`/api/v1/workspaces/${slug}/invitations`, 'POST', values);
    if (!result.ok) return setOutcome({ tone: 'error', message: applyIssues(result, form.setError) });
    setOutcome({ tone: 'info', message: `Invitation sent to ${values.email} as ${values.role}. The link works once, for 7 days.` });
    form.reset({ email: '', role: values.role });
    router.refresh();
  };

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={form.handleSubmit(onValid)} aria-label="Invite someone" className="grid max-w-xl gap-3 sm:grid-cols-[1fr_12rem_auto] sm:items-start">
        <InputField<Values> name="email" label="E-mail" type="email" autoComplete="off" />
        <SelectField<Values> name="role" label="Role" options={ROLE_OPTIONS} />
        <div className="sm:pt-6">
          <SubmitButton busy={form.formState.isSubmitting}>Send invitation</SubmitButton>
        </div>
        <div className="sm:col-span-3">
          <FormMessage tone={outcome?.tone} message={outcome?.message} />
        </div>
      </form>
    </FormProvider>
  );
}
