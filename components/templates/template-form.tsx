'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { FormProvider, useFieldArray, useForm, useFormContext, type UseFormRegister } from 'react-hook-form';
import type { z } from 'zod';
import { FormMessage, SubmitButton } from '@/components/account/form-controls';
import { ConflictLink, useRecordSave } from '@/components/records/use-record-save';
import { FieldErrorText, FormSection, LabelledField, SelectField, TextField, fieldId, inputClass, useFieldError } from '@/components/generator/fields';
import type { Field } from '@/lib/fields/field';
import type { Template } from '@/lib/templates/template';
import { TEMPLATE_FIELD_LIST, templateFields } from '@/lib/templates/template-fields';
import { EMPTY_TEMPLATE, templateFormSchema } from '@/lib/templates/template-schema';
import { OptionalNumberField, commaListAsNumbers } from './optional-number-field';

type Input = z.input<typeof templateFormSchema>;
type Output = z.output<typeof templateFormSchema>;

const CHOICE_LABELS: Record<string, string> = {
  cw: 'Clockwise (seen from the scale side)',
  ccw: 'Counter-clockwise (seen from the scale side)',
};

/** Where the form starts a new section, walking the field table in order; a new field lands in the section before it. */
const SECTION_STARTS: Partial<Record<string, string>> = {
  name: 'Engine',
  rotation: 'Flywheel and flange',
  staticAdvanceDeg: 'Timing targets',
  notes: 'Notes',
};

type Section = { title: string; fields: Field[] };

const SECTIONS: Section[] = TEMPLATE_FIELD_LIST.reduce<Section[]>((sections, field) => {
  const title = SECTION_STARTS[field.key];
  if (title || sections.length === 0) sections.push({ title: title ?? '', fields: [] });
  // A flag (archived) is set by its own action, not by the form.
  if (field.kind !== 'flag') sections.at(-1)!.fields.push(field);
  return sections;
}, []);

/** Runs of number fields share a grid row; every other field stands alone. */
function runsOf(fields: Field[]): Field[][] {
  const runs: Field[][] = [];
  for (const field of fields) {
    const number = field.kind === 'number' || field.kind === 'length';
    const last = runs.at(-1);
    if (number && last && (last[0]!.kind === 'number' || last[0]!.kind === 'length')) last.push(field);
    else runs.push([field]);
  }
  return runs;
}

function defaults(template: Template | null): Input {
  if (!template) return { ...EMPTY_TEMPLATE, name: '' };
  const { id: _i, createdAt: _c, updatedAt: _u, createdBy: _cb, updatedBy: _ub, ...fields } = template;
  return fields;
}

/** A list of numbers typed comma-separated. */
function NumberListField({ field }: { field: Field }) {
  const { register } = useFormContext<Input>();
  const name = field.key as 'advanceMarksDeg';
  return (
    <LabelledField name={name} label={<>{field.label} <span className="font-normal text-steel-500">({field.unit}, comma-separated)</span></>} help={field.help}>
      {(wiring) => <input {...wiring} className={`${inputClass} font-mono`} {...register(name, { setValueAs: commaListAsNumbers })} />}
    </LabelledField>
  );
}

/** A long text gets a text area. */
function LongTextField({ field }: { field: Field }) {
  const { register } = useFormContext<Input>();
  const name = field.key as 'notes';
  return (
    <LabelledField name={name} label={field.label} help={field.help}>
      {(wiring) => <textarea {...wiring} rows={4} maxLength={field.maxLength} className={inputClass} {...register(name)} />}
    </LabelledField>
  );
}

const LONG_TEXT = 200;

/** One field of the table as a form control, chosen by its kind. */
function TemplateField({ field }: { field: Field }) {
  const name = field.key as keyof Input & string;
  switch (field.kind) {
    case 'number':
    case 'length':
      return <OptionalNumberField<Input> name={name} label={field.label} unit={field.unit} help={field.help} />;
    case 'choice':
      return (
        <SelectField<Input> name={name} label={field.label} options={(field.choices ?? []).map((value) => ({ value, label: CHOICE_LABELS[value] ?? value }))} />
      );
    case 'list':
      return field.unit ? <NumberListField field={field} /> : <PortTargets />;
    case 'text':
      return (field.maxLength ?? 0) > LONG_TEXT ? (
        <LongTextField field={field} />
      ) : (
        <TextField<Input> name={name} label={field.label} maxLength={field.maxLength} help={field.help} />
      );
    default:
      return null;
  }
}

function PortTargets() {
  const { control, register } = useFormContext<Input>();
  const { fields, append, remove } = useFieldArray({ control, name: 'portTargets' });
  const error = useFieldError('portTargets');
  return (
    <div className="space-y-2">
      <p className="text-xs text-steel-500">{templateFields.portTargets.help}</p>
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
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(templateFormSchema), defaultValues: defaults(template) });
  const { outcome, save } = useRecordSave({ collectionUrl: `/api/v1/workspaces/${slug}/templates`, record: template, answerKey: 'template', pageOf: (id) => `/w/${slug}/templates/${id}`, setError: form.setError });


  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={form.handleSubmit(save)} aria-label={template ? 'Edit template' : 'New template'} className="space-y-4">
        {SECTIONS.map((section) => (
          <FormSection key={section.title} title={section.title}>
            {runsOf(section.fields).map((run) =>
              run.length > 1 ? (
                <div key={run[0]!.key} className="grid gap-3 sm:grid-cols-3">
                  {run.map((field) => (
                    <TemplateField key={field.key} field={field} />
                  ))}
                </div>
              ) : (
                <TemplateField key={run[0]!.key} field={run[0]!} />
              ),
            )}
          </FormSection>
        ))}
        <div className="flex flex-wrap items-center gap-3">
          <SubmitButton busy={form.formState.isSubmitting}>{template ? 'Save changes' : 'Create template'}</SubmitButton>
          <Link
            href={template ? `/w/${slug}/templates/${template.id}` : `/w/${slug}/templates`}
            className="inline-flex min-h-11 items-center rounded-md border border-steel-300 px-4 text-sm font-medium hover:bg-steel-100 dark:border-steel-600 dark:hover:bg-steel-800"
          >
            Cancel
          </Link>
          <ConflictLink outcome={outcome} href={`/w/${slug}/templates/${template?.id}`} />
        </div>
        <FormMessage tone={outcome?.tone} message={outcome?.message} />
      </form>
    </FormProvider>
  );
}
