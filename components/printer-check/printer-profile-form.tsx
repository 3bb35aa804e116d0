'use client';

import { HydratedForm } from '@/components/hydrated-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { describeScale, printerMeasurementFields as fields, profileFromMeasurement, printerMeasurementSchema, type PrinterMeasurement } from '@/lib/printer-profile';
import { NumberField, TextField } from '@/components/generator/fields';
import { saveProfile } from './printer-profile-store';

type MeasurementForm = { name: string; measuredXMm: number; measuredYMm: number };

/** Step 3: the two measured bar lengths become a profile kept in this browser. */
export function PrinterProfileForm() {
  const form = useForm<MeasurementForm, unknown, PrinterMeasurement>({
    resolver: zodResolver(printerMeasurementSchema),
    defaultValues: { name: '' },
    mode: 'onTouched',
  });
  const [saved, setSaved] = useState<string | undefined>(undefined);

  const onValid = async (measurement: PrinterMeasurement) => {
    const result = profileFromMeasurement(measurement);
    if (!result.ok) return; // the resolver already ran the same schema
    const profile = await saveProfile(result.profile);
    setSaved(`Saved “${profile.name}”: ${describeScale(profile)}. The sheet maker now offers it on every download.`);
    form.reset({ name: '' });
  };

  return (
    <FormProvider {...form}>
      {/* A "Saved …" line belongs to the last save only: any edit or a refused save clears it. */}
      <HydratedForm
        noValidate
        onSubmit={form.handleSubmit(onValid, () => setSaved(undefined))}
        onChange={() => setSaved(undefined)}
        aria-label="Printer profile"
        className="space-y-4"
      >
        <TextField<MeasurementForm> name="name" label={fields.name.label} placeholder="e.g. Workshop laser, plain paper" maxLength={fields.name.maxLength} />
        <div className="grid gap-4 sm:grid-cols-2">
          <NumberField<MeasurementForm>
            name="measuredXMm"
            label="Horizontal bar measures"
            unit="mm"
            step={0.1}
            placeholder="100.0"
            help={fields.measuredXMm.help}
          />
          <NumberField<MeasurementForm>
            name="measuredYMm"
            label="Vertical bar measures"
            unit="mm"
            step={0.1}
            placeholder="100.0"
            help={fields.measuredYMm.help}
          />
        </div>
        <button type="submit" className="min-h-11 rounded-md bg-gauge-600 px-4 text-sm font-semibold text-white shadow-sm hover:bg-gauge-700">
          Save profile
        </button>
        <p aria-live="polite" className="text-sm text-steel-700 dark:text-steel-200">
          {saved ?? ''}
        </p>
      </HydratedForm>
    </FormProvider>
  );
}
