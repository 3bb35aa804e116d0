'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormMessage, InputField, SubmitButton } from '@/components/account/form-controls';
import { applyIssues, submitJson } from '@/components/account/submit-json';
import { createShopSchema } from '@/lib/account-forms';

type Values = z.infer<typeof createShopSchema>;

/** Creates a shop workspace (the caller becomes its owner) or renames one (`renameSlug`). */
export function ShopNameForm({ renameSlug, currentName }: { renameSlug?: string; currentName?: string }) {
  const form = useForm<Values>({ resolver: zodResolver(createShopSchema), defaultValues: { name: currentName ?? '' } });
  const [error, setError] = useState<string | undefined>();
  const router = useRouter();

  const onValid = async (values: Values) => {
    setError(undefined);
    const result = renameSlug
      ? await submitJson(`/api/v1/workspaces/${renameSlug}`, 'PATCH', values)
      : await submitJson('/api/v1/workspaces', 'POST', values);
    if (!result.ok) return setError(applyIssues(result, form.setError));
    // The header's workspace menu shows the new name, so the layout is rendered again too.
    router.push(`/w/${renameSlug ?? String(result.body.slug)}`);
    router.refresh();
  };

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={form.handleSubmit(onValid)} aria-label={renameSlug ? 'Rename the workspace' : 'Create a shop'} className="max-w-sm space-y-3">
        <InputField<Values> name="name" label={renameSlug ? 'Workspace name' : 'Shop name'} autoComplete="organization" />
        <FormMessage tone="error" message={error} />
        <SubmitButton busy={form.formState.isSubmitting}>{renameSlug ? 'Rename' : 'Create shop'}</SubmitButton>
      </form>
    </FormProvider>
  );
}
