'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { FormProvider, useFieldArray, useForm, useFormContext, useWatch, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { FormMessage, SubmitButton } from '@/components/account/form-controls';
import { ConflictLink, useRecordSave } from '@/components/records/use-record-save';
import { FieldErrorText, FormSection, LabelledField, SelectField, TextField, fieldId, inputClass, useFieldError } from '@/components/generator/fields';
import { HydratedForm } from '@/components/hydrated-form';
import { OptionalNumberField, blankAsNull } from '@/components/templates/optional-number-field';
import type { Build } from '@/lib/builds/build';
import { buildFields, type BuildFields } from '@/lib/builds/build-fields';
import { buildFormSchema } from '@/lib/builds/build-schema';
import { liveResults } from '@/lib/builds/live-fields';
import { templatePrefill } from '@/lib/builds/template-prefill';
import type { Template } from '@/lib/templates/template';
import { BlowdownResult, PortResult, TdcResult, TimingResult, ToleranceNote } from './result-texts';

/** The form holds a whole record; the schema's preprocessing (blank stops, blank port rows) only loosens what it accepts. */
type Input = BuildFields & { version?: number };
type Output = z.output<typeof buildFormSchema>;
type Option = { id: number; name: string };

const F = buildFields;
const ROTATIONS = [
  { value: 'cw', label: 'Clockwise (seen from the scale side)' },
  { value: 'ccw', label: 'Counter-clockwise (seen from the scale side)' },
] as const;
const CHECKS = [
  { value: '', label: 'Not checked yet' },
  { value: 'static-light', label: 'Static, continuity light' },
  { value: 'static-feeler', label: 'Static, feeler' },
  { value: 'strobe', label: 'Strobe, at a stated engine speed' },
] as const;
const NUMBERINGS = [
  { value: 'full', label: '0–360° (full turn)' },
  { value: 'split', label: '0–180° each side of TDC' },
] as const;

/** The form's starting values: the stored record, or a new one (from a template when one was chosen). */
function startValues(fields: BuildFields, version?: number): Input {
  return {
    ...fields,
    stops: fields.stops ?? { numbering: 'full', readingADeg: null as unknown as number, readingBDeg: null as unknown as number },
    ...(version ? { version } : {}),
  };
}

function StopReadings() {
  const { register, control } = useFormContext<Input>();
  const numbering = useWatch({ control, name: 'stops.numbering' });
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      <SelectField<Input> name="stops.numbering" label="Wheel numbering" options={NUMBERINGS} />
      {(['A', 'B'] as const).map((which) => (
        <div key={which} className="space-y-1">
          <OptionalNumberField<Input> name={`stops.reading${which}Deg`} label={`Reading ${which}`} unit="°" />
          {numbering === 'split' ? (
            <select aria-label={`Reading ${which} side`} className={inputClass} {...register(`stops.reading${which}Side`, { setValueAs: (v) => (v === '' ? undefined : v) })}>
              <option value="">Side…</option>
              <option value="BTDC">BTDC</option>
              <option value="ATDC">ATDC</option>
            </select>
          ) : null}
        </div>
      ))}
    </div>
  );
}

/** The timing is entered one way, degrees or mm before TDC; the record works out the other. */
function TimingSet() {
  const { setValue, getValues } = useFormContext<Input>();
  const [unit, setUnit] = useState<'deg' | 'mm'>(getValues('timingSetMmBTDC') != null && getValues('timingSetDegBTDC') == null ? 'mm' : 'deg');
  const switchTo = (next: 'deg' | 'mm') => {
    setUnit(next);
    setValue(next === 'deg' ? 'timingSetMmBTDC' : 'timingSetDegBTDC', null);
  };
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      <div className="space-y-1">
        <label htmlFor="timing-unit" className="block text-sm font-medium">
          Timing entered in
        </label>
        <select id="timing-unit" value={unit} onChange={(e) => switchTo(e.target.value as 'deg' | 'mm')} className={inputClass}>
          <option value="deg">degrees BTDC</option>
          <option value="mm">mm of piston travel BTDC</option>
        </select>
      </div>
      {unit === 'deg' ? (
        <OptionalNumberField<Input> key="deg" name="timingSetDegBTDC" label={F.timingSetDegBTDC.label} unit="° BTDC" />
      ) : (
        <OptionalNumberField<Input> key="mm" name="timingSetMmBTDC" label={F.timingSetMmBTDC.label} unit="mm BTDC" />
      )}
      <OptionalNumberField<Input> name="advanceDeg" label={F.advanceDeg.label} unit="° BTDC" help="From the template or the engine maker’s figure" />
    </div>
  );
}

function TimingCheck() {
  const { register } = useFormContext<Input>();
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <LabelledField name="timingCheck" label={F.timingCheck.label}>
        {(wiring) => (
          <select {...wiring} className={inputClass} {...register('timingCheck', { setValueAs: (v) => (v === '' ? null : v) })}>
            {CHECKS.map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </select>
        )}
      </LabelledField>
      <OptionalNumberField<Input> name="timingCheckRpm" label={F.timingCheckRpm.label} unit="rpm" help="Only for a strobe check" />
    </div>
  );
}

function MeasuredPorts({ results, toleranceDeg, locale }: { results: ReturnType<typeof liveResults>; toleranceDeg: number; locale: string }) {
  const { control, register } = useFormContext<Input>();
  const { fields, append, remove } = useFieldArray({ control, name: 'ports' });
  const typed = useWatch({ control, name: 'ports' }) ?? [];
  const error = useFieldError('ports');
  return (
    <div className="space-y-2">
      <p className="text-xs text-steel-500">Each port’s top edge measured down from the cylinder top (the port calculator’s figure). Rows left blank are not saved.</p>
      {fields.map((field, index) => {
        // Results are keyed by the name as typed now (rows without a height have none).
        const port = results.ports.find((p) => p.name === (typed[index]?.name || 'Port'));
        return (
          <div key={field.id} className="grid items-end gap-2 sm:grid-cols-[10rem_8rem_1fr_auto]">
            <PortCell index={index} part="name" label="Port" register={register} />
            <PortCell index={index} part="heightMm" label="Edge depth (mm)" register={register} />
            <div className="pb-2">{port ? <PortResult port={port} toleranceDeg={toleranceDeg} locale={locale} /> : null}</div>
            <button type="button" onClick={() => remove(index)} className="rounded border border-steel-300 px-2 py-2 text-xs">
              Remove <span className="sr-only">port {index + 1}</span>
            </button>
          </div>
        );
      })}
      <button type="button" onClick={() => append({ name: '', heightMm: null as unknown as number })} className="rounded border border-steel-300 px-3 py-1 text-sm">
        Add a port
      </button>
      <FieldErrorText id="field-ports-error" message={fields.length ? undefined : error} />
    </div>
  );
}

function PortCell({ index, part, label, register }: { index: number; part: 'name' | 'heightMm'; label: string; register: ReturnType<typeof useFormContext<Input>>['register'] }) {
  const name = `ports.${index}.${part}` as const;
  const error = useFieldError(name);
  const id = fieldId(name);
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-xs font-medium">
        {label} <span className="sr-only">{index + 1}</span>
      </label>
      <input
        id={id}
        inputMode={part === 'name' ? undefined : 'decimal'}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-error`}
        className={`${inputClass} ${part === 'name' ? '' : 'font-mono'}`}
        {...register(name, part === 'name' ? {} : { setValueAs: blankAsNull })}
      />
      <FieldErrorText id={`${id}-error`} message={error} />
    </div>
  );
}

function PortTargets() {
  const { control, register } = useFormContext<Input>();
  const { fields, append, remove } = useFieldArray({ control, name: 'portTargets' });
  if (fields.length === 0)
    return (
      <button type="button" onClick={() => append({ name: '', opensCrankDeg: 90, closesCrankDeg: 270 })} className="rounded border border-steel-300 px-3 py-1 text-sm">
        Add a port target
      </button>
    );
  return (
    <details className="text-sm">
      <summary className="cursor-pointer">Port targets ({fields.length}), from the template: crank degrees after TDC</summary>
      <div className="mt-2 space-y-2">
        {fields.map((field, index) => (
          <div key={field.id} className="grid grid-cols-[minmax(0,1fr)_minmax(0,5rem)_minmax(0,5rem)_auto] items-end gap-2 sm:grid-cols-[minmax(0,1fr)_6rem_6rem_auto]">
            <input aria-label={`Target ${index + 1} name`} className={inputClass} {...register(`portTargets.${index}.name`)} />
            <input aria-label={`Target ${index + 1} opens`} className={`${inputClass} font-mono`} {...register(`portTargets.${index}.opensCrankDeg`, { setValueAs: (v) => (v === '' ? Number.NaN : Number(v)) })} />
            <input aria-label={`Target ${index + 1} closes`} className={`${inputClass} font-mono`} {...register(`portTargets.${index}.closesCrankDeg`, { setValueAs: (v) => (v === '' ? Number.NaN : Number(v)) })} />
            <button type="button" onClick={() => remove(index)} className="rounded border border-steel-300 px-2 py-2 text-xs">
              Remove
            </button>
          </div>
        ))}
        <button type="button" onClick={() => append({ name: '', opensCrankDeg: 90, closesCrankDeg: 270 })} className="rounded border border-steel-300 px-3 py-1 text-sm">
          Add a port target
        </button>
      </div>
    </details>
  );
}

function OtherMeasurements() {
  const { control, register } = useFormContext<Input>();
  const { fields, append, remove } = useFieldArray({ control, name: 'otherMeasurements' });
  return (
    <div className="space-y-2">
      {fields.map((field, index) => (
        <div key={field.id} className="grid grid-cols-[minmax(0,1fr)_minmax(0,6rem)_minmax(0,4rem)_auto] items-end gap-2 sm:grid-cols-[minmax(0,1fr)_8rem_5rem_auto]">
          <input aria-label={`Measurement ${index + 1} name`} placeholder="What" className={inputClass} {...register(`otherMeasurements.${index}.name`)} />
          <input aria-label={`Measurement ${index + 1} value`} placeholder="Value" className={`${inputClass} font-mono`} {...register(`otherMeasurements.${index}.value`)} />
          <input aria-label={`Measurement ${index + 1} unit`} placeholder="Unit" className={inputClass} {...register(`otherMeasurements.${index}.unit`)} />
          <button type="button" onClick={() => remove(index)} className="rounded border border-steel-300 px-2 py-2 text-xs">
            Remove
          </button>
        </div>
      ))}
      <button type="button" onClick={() => append({ name: '', value: '', unit: '' })} className="rounded border border-steel-300 px-3 py-1 text-sm">
        Add a measurement
      </button>
    </div>
  );
}

function TemplatePicker({ templates }: { templates: Template[] }) {
  const { register, setValue, getValues } = useFormContext<Input>();
  const choose = (value: string) => {
    const template = templates.find((t) => t.id === Number(value));
    if (!template) {
      setValue('templateId', null);
      setValue('templateVersion', null);
      return;
    }
    const prefill = templatePrefill(template);
    for (const [key, v] of Object.entries(prefill)) {
      if (key === 'engineDescription' && getValues('engineDescription')) continue;
      setValue(key as keyof Input, v as never, { shouldDirty: true });
    }
    const current = getValues('ports') ?? [];
    if (current.length === 0) setValue('ports', template.portTargets.map((p) => ({ name: p.name, heightMm: null as unknown as number })));
  };
  return (
    <LabelledField name="templateId" label={F.templateId.label} help="Copies the template’s stroke, rod, rotation, advance and port targets; the record keeps the template version it used.">
      {(wiring) => (
        <select
          {...wiring}
          className={inputClass}
          {...register('templateId', { setValueAs: (v) => (v === '' || v === null ? null : Number(v)), onChange: (e) => choose(e.target.value) })}
        >
          <option value="">None</option>
          {templates.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name} (version {t.version})
            </option>
          ))}
        </select>
      )}
    </LabelledField>
  );
}

/** `locale`: the reader's, for the live results' figures (lib/format/number-format.ts). */
type Props = { slug: string; build: Build | null; fields: BuildFields; templates: Template[]; technicians: Option[]; toleranceDeg: number; locale: string };

/**
 * Create or edit a build record, validated in the browser with the same zod schema as the API,
 * with the results worked out live beside the measurements by the same functions the server uses.
 * An edit sends the version it was loaded at; a 409 keeps every typed value and says who saved.
 */
export function BuildForm({ slug, build, fields, templates, technicians, toleranceDeg, locale }: Props) {
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(buildFormSchema) as unknown as Resolver<Input, unknown, Output>, defaultValues: startValues(fields, build?.version) });
  const { outcome, save } = useRecordSave({ collectionUrl: `/api/v1/workspaces/${slug}/builds`, record: build, answerKey: 'build', pageOf: (id) => `/w/${slug}/builds/${id}`, setError: form.setError });
  const values = useWatch({ control: form.control });
  const results = liveResults(values as Record<string, unknown>, toleranceDeg);


  return (
    <FormProvider {...form}>
      <HydratedForm noValidate onSubmit={form.handleSubmit(save)} aria-label={build ? 'Edit build record' : 'New build record'} className="space-y-4">
        <FormSection title="Customer and engine">
          <div className="grid gap-3 sm:grid-cols-3">
            <TextField<Input> name="customerName" label={F.customerName.label} maxLength={F.customerName.maxLength} />
            <TextField<Input> name="customerEmail" label={F.customerEmail.label} maxLength={F.customerEmail.maxLength} help="Where the customer’s copy is mailed" />
            <TextField<Input> name="customerPhone" label={F.customerPhone.label} maxLength={F.customerPhone.maxLength} />
          </div>
          <TemplatePicker templates={templates} />
          <TextField<Input> name="engineDescription" label={F.engineDescription.label} maxLength={F.engineDescription.maxLength} help={F.engineDescription.help} />
          <div className="grid gap-3 sm:grid-cols-4">
            <TextField<Input> name="engineNumber" label={F.engineNumber.label} maxLength={F.engineNumber.maxLength} mono />
            <TextField<Input> name="frameNumber" label={F.frameNumber.label} maxLength={F.frameNumber.maxLength} mono />
            <LabelledField name="technicianId" label={F.technicianId.label}>
              {(wiring) => (
                <select {...wiring} className={inputClass} {...form.register('technicianId', { setValueAs: (v) => (v === '' || v === null ? null : Number(v)) })}>
                  <option value="">Me</option>
                  {technicians.map((t) => (
                    <option key={t.id} value={t.id}>
                      {t.name}
                    </option>
                  ))}
                </select>
              )}
            </LabelledField>
            <LabelledField name="openedOn" label={F.openedOn.label}>
              {(wiring) => <input {...wiring} type="date" className={inputClass} {...form.register('openedOn')} />}
            </LabelledField>
          </div>
        </FormSection>
        <FormSection title="Engine geometry">
          <div className="grid gap-3 sm:grid-cols-4">
            <OptionalNumberField<Input> name="strokeMm" label={F.strokeMm.label} unit="mm" />
            <OptionalNumberField<Input> name="rodMm" label="Con-rod length" unit="mm" help="Centre to centre" />
            <OptionalNumberField<Input> name="pinOffsetMm" label={F.pinOffsetMm.label} unit="mm" help={F.pinOffsetMm.help} />
            <OptionalNumberField<Input> name="deckMm" label={F.deckMm.label} unit="mm" help={F.deckMm.help} />
          </div>
          <SelectField<Input> name="rotation" label={F.rotation.label} options={ROTATIONS} />
        </FormSection>
        <FormSection title="Top dead centre (positive stop)">
          <StopReadings />
          <TdcResult tdc={results.tdc} locale={locale} />
        </FormSection>
        <FormSection title="Ignition timing">
          <TimingSet />
          <TimingResult results={results} locale={locale} />
          <TimingCheck />
        </FormSection>
        <FormSection title="Port timing">
          <MeasuredPorts results={results} toleranceDeg={toleranceDeg} locale={locale} />
          <BlowdownResult results={results} locale={locale} />
          <PortTargets />
          <ToleranceNote toleranceDeg={toleranceDeg} locale={locale} />
        </FormSection>
        <FormSection title="Other measurements and notes">
          <OptionalNumberField<Input> name="squishMm" label={F.squishMm.label} unit="mm" />
          <OtherMeasurements />
          <LabelledField name="notes" label={F.notes.label} help="Printed on the customer’s copy">
            {(wiring) => <textarea {...wiring} rows={4} maxLength={F.notes.maxLength} className={inputClass} {...form.register('notes')} />}
          </LabelledField>
        </FormSection>
        <div className="flex items-center gap-3">
          <SubmitButton busy={form.formState.isSubmitting}>{build ? 'Save changes' : 'Create record'}</SubmitButton>
          <ConflictLink outcome={outcome} href={`/w/${slug}/builds/${build?.id}`} />
        </div>
        <FormMessage tone={outcome?.tone} message={outcome?.message} />
      </HydratedForm>
    </FormProvider>
  );
}
