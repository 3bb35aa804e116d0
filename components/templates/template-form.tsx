'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { FormProvider, useFieldArray, useForm, useFormContext, type UseFormRegister } from 'react-hook-form';
import type { z } from 'zod';
import { FormMessage, SubmitButton } from '@/components/account/form-controls';
import { applyIssues, submitJson } from '@/components/account/submit-json';
import { FieldErrorText, FormSection, LabelledField, SelectField, TextField, fieldId, inputClass, useFieldError } from '@/components/generator/fields';
import type { Template } from '@/lib/templates/template';
import { EMPTY_TEMPLATE, templateFormSchema } from '@/lib/templates/template-schema';
import { OptionalNumberField, commaListAsNumbers } from './optional-number-field';

type Input = z.input<typeof templateFormSchema>;
type Output = z.output<typeof templateFormSchema>;

const ROTATIONS = [
  { value: 'cw', label: 'Clockwise (seen from the scale side)' },
  { value: 'ccw', label: 'Counter-clockwise (seen from the scale side)' },
] as const;

function defaults(template: Template | null): Input {
  if (!template) return { ...EMPTY_TEMPLATE, name: '' };
  const { id: _i, createdAt: _c, updatedAt: _u, createdBy: _cb, updatedBy: _ub, ...fields } = template;
  return fields;
}

function AdvanceMarksField() {
  const { register } = useFormContext<Input>();
  return (
    <LabelledField
      name="advanceMarksDeg"
      label={<>Advance marks <span className="font-normal text-steel-500">(° BTDC, comma-separated)</span></>}
      help="For example 16, 18, 20. Left empty, the sheet marks the static advance alone."
    >
      {(wiring) => <input {...wiring} className={`${inputClass} font-mono`} {...register('advanceMarksDeg', { setValueAs: commaListAsNumbers })} />}
    </LabelledField>
  );
}

function NotesField() {
  const { register } = useFormContext<Input>();
  return (
    <LabelledField name="notes" label="Notes" help="Where the pointer sits, which marks to trust, anything the next person should know.">
      {(wiring) => <textarea {...wiring} rows={4} maxLength={4000} className={inputClass} {...register('notes')} />}
    </LabelledField>
  );
}

function PortTargets() {
  const { control, register } = useFormContext<Input>();
  const { fields, append, remove } = useFieldArray({ control, name: 'portTargets' });
  const error = useFieldError('portTargets');
  return (
    <div className="space-y-2">
      <p className="text-xs text-steel-500">Crank angles from TDC in the direction of rotation (0–360°): exhaust opening near 90° ATDC is 90, its closing 270.</p>
      {fields.map((field, index) => (
        <div key={field.id} className="grid grid-cols-[minmax(0,1fr)_minmax(0,5rem)_minmax(0,5rem)_auto] items-end gap-2 sm:grid-cols-[minmax(0,1fr)_7rem_7rem_auto]">
          <PortCell index={index} part="name" label="Port" register={register} />
          <PortCell index={index} part="opensCrankDeg" label="Opens (°)" register={register} />
          <PortCell index={index} part="closesCrankDeg" label="Closes (°)" register={register} />
          <button type="button" onClick={() => remove(index)} className="min-h-11 rounded border border-steel-300 px-2 text-xs">
            Remove <span className="sr-only">port {index + 1}</span>
          </button>
        </div>
      ))}
      <button type="button" onClick={() => append({ name: '', opensCrankDeg: 90, closesCrankDeg: 270 })} className="min-h-11 rounded border border-steel-300 px-3 text-sm">
        Add a port
      </button>
      <FieldErrorText id="field-portTargets-error" message={fields.length ? undefined : error} />
    </div>
  );
}

function PortCell({ index, part, label, register }: { index: number; part: 'name' | 'opensCrankDeg' | 'closesCrankDeg'; label: string; register: UseFormRegister<Input> }) {
  const name = `portTargets.${index}.${part}` as const;
  const error = useFieldError(name);
  const id = fieldId(name);
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-xs font-medium">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-error`}
        inputMode={part === 'name' ? undefined : 'decimal'}
        className={`${inputClass} ${part === 'name' ? '' : 'font-mono'}`}
        {...register(name, part === 'name' ? {} : { setValueAs: (v: unknown) => (v === '' ? Number.NaN : Number(v)) })}
      />
      <FieldErrorText id={`${id}-error`} message={error} />
    </div>
  );
}


/**
 * Create or edit a template, validated in the browser with the same zod schema as the API.
 * An edit sends the version it was loaded at; a 409 keeps every typed value in the form
 * and says who saved in between, with a link to reload.
 */
export function TemplateForm({ slug, template }: { slug: string; template: Template | null }) {
  const router = useRouter();
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(templateFormSchema), defaultValues: defaults(template) });
  const [outcome, setOutcome] = useState<{ tone: 'info' | 'error'; message: string; conflict?: boolean }>();

  const onValid = async (values: Output) => {
    const { version, ...fields } = values;
    const result = template
      ? await submitJson(`/api/v1/workspaces/${slug}/templates/${template.id}`, 'PATCH', { ...fields, version: version ?? template.version })
      : await submitJson(`/api/v1/workspaces/${slug}/templates`, 'POST', fields);
    if (result.status === 409) return setOutcome({ tone: 'error', message: String(result.body.error), conflict: true });
    if (!result.ok) return setOutcome({ tone: 'error', message: applyIssues(result, form.setError) });
    const saved = result.body.template as Template;
    router.push(`/w/${slug}/templates/${saved.id}`);
    router.refresh();
  };

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={form.handleSubmit(onValid)} aria-label={template ? 'Edit template' : 'New template'} className="space-y-4">
        <FormSection title="Engine">
          <TextField<Input> name="name" label="Name" maxLength={80} />
          <TextField<Input> name="description" label="Engine description" maxLength={200} help="What engine this is: capacity, induction, cooling." />
          <div className="grid gap-3 sm:grid-cols-3">
            <OptionalNumberField<Input> name="boreMm" label="Bore" unit="mm" />
            <OptionalNumberField<Input> name="strokeMm" label="Stroke" unit="mm" />
            <OptionalNumberField<Input> name="rodMm" label="Con-rod length" unit="mm" help="Centre to centre" />
          </div>
        </FormSection>
        <FormSection title="Flywheel and flange">
          <SelectField<Input> name="rotation" label="Rotation" options={ROTATIONS} />
          <div className="grid gap-3 sm:grid-cols-2">
            <OptionalNumberField<Input> name="rimDiameterMm" label="Flywheel rim diameter" unit="mm" help="For rim strips; with a flange diameter also flange rings" />
            <OptionalNumberField<Input> name="faceDiameterMm" label="Flywheel face diameter" unit="mm" help="For degree wheels" />
            <OptionalNumberField<Input> name="flangeDiameterMm" label="Flange diameter" unit="mm" help="Magneto flange or stator plate" />
            <OptionalNumberField<Input> name="hubHoleMm" label="Hub hole" unit="mm" help="Hole cut in a degree wheel" />
          </div>
        </FormSection>
        <FormSection title="Timing targets">
          <OptionalNumberField<Input> name="staticAdvanceDeg" label="Static advance" unit="° BTDC" help="Small air-cooled two-strokes are typically 16–20° BTDC; the engine maker’s manual comes first." />
          <AdvanceMarksField />
          <PortTargets />
        </FormSection>
        <FormSection title="Notes">
          <NotesField />
        </FormSection>
        <div className="flex flex-wrap items-center gap-3">
          <SubmitButton busy={form.formState.isSubmitting}>{template ? 'Save changes' : 'Create template'}</SubmitButton>
          <Link
            href={template ? `/w/${slug}/templates/${template.id}` : `/w/${slug}/templates`}
            className="inline-flex min-h-11 items-center rounded-md border border-steel-300 px-4 text-sm font-medium hover:bg-steel-100 dark:border-steel-600 dark:hover:bg-steel-800"
          >
            Cancel
          </Link>
          {outcome?.conflict ? (
            <a href={`/w/${slug}/templates/${template?.id}`} target="_blank" rel="noreferrer" className="text-sm text-gauge-700 underline">
              Open the current version (your edits stay here)
            </a>
          ) : null}
        </div>
        <FormMessage tone={outcome?.tone} message={outcome?.message} />
      </form>
    </FormProvider>
  );
}
