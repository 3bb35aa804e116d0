import { diffFields } from '@/lib/fields/field-diff';
import { TEMPLATE_FIELD_NAMES, type TemplateFields } from './template-schema';
import type { FieldChange } from './template';

/** The fields that differ between two states of a template, in schema order, old → new. */
export function diffTemplateFields(before: Partial<TemplateFields>, after: Partial<TemplateFields>): FieldChange[] {
  return diffFields(TEMPLATE_FIELD_NAMES, before, after);
}

/** The changes that record a template's creation: every field that is set, from nothing. */
export function creationChanges(fields: TemplateFields): FieldChange[] {
  return diffTemplateFields({}, fields).filter((c) => !isEmptyValue(c.to));
}

function isEmptyValue(value: unknown): boolean {
  return value === null || value === '' || value === false || (Array.isArray(value) && value.length === 0);
}
