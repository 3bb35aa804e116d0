'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { FormMessage, SubmitButton } from '@/components/account/form-controls';
import { applyIssues, submitJson } from '@/components/account/submit-json';
import { NumberField } from '@/components/generator/fields';
import { HydratedForm } from '@/components/hydrated-form';
import { buildSettingsFields, buildSettingsSchema, type BuildSettings } from '@/lib/builds/build-settings';

const F = buildSettingsFields.toleranceDeg;

/** The workspace's port duration tolerance for build records, validated with the API's schema. */
export function BuildSettingsForm({ slug, settings }: { slug: string; settings: BuildSettings }) {
  const form = useForm<BuildSettings>({ resolver: zodResolver(buildSettingsSchema), defaultValues: settings });
  const [outcome, setOutcome] = useState<{ tone: 'info' | 'error'; message: string }>();
  const router = useRouter();
  const onValid = async (values: BuildSettings) => {
    const result = await submitJson(`/api/v1/workspaces/${slug}/build-settings`, 'PUT', values);
    if (!result.ok) return setOutcome({ tone: 'error', message: applyIssues(result, form.setError) });
    setOutcome({ tone: 'info', message: `Saved: records saved from now on are judged within ±${values.toleranceDeg}°.` });
    router.refresh();
  };
  return (
    <FormProvider {...form}>
      <HydratedForm noValidate onSubmit={form.handleSubmit(onValid)} aria-label="Build record settings" className="max-w-sm space-y-3">
        <NumberField<BuildSettings> name="toleranceDeg" label={`${F.label} (±°)`} help={F.help} step={0.1} />
        <FormMessage tone={outcome?.tone} message={outcome?.message} />
        <SubmitButton busy={form.formState.isSubmitting}>Save tolerance</SubmitButton>
      </HydratedForm>
    </FormProvider>
  );
}
