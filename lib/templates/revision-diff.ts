import { TEMPLATE_FIELD_NAMES, type TemplateFields } from './template-schema';
import type { FieldChange } from './template';

function sameValue(a: unknown, b: unknown): boolean {
  return JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
}

/** The fields that differ between two states of a template, in schema order, old → new. */
export function diffTemplateFields(before: Partial<TemplateFields>, after: Partial<TemplateFields>): FieldChange[] {
  const changes: FieldChange[] = [];
  for (const field of TEMPLATE_FIELD_NAMES) {
    if (!(field in after)) continue;
    const from = before[field] ?? null;
    const to = after[field] ?? null;
    if (!sameValue(from, to)) changes.push({ field, from, to });
  }
  return changes;
}

/** The changes that record a template's creation: every field that is set, from nothing. */
export function creationChanges(fields: TemplateFields): FieldChange[] {
  return diffTemplateFields({}, fields).filter((c) => !isEmptyValue(c.to));
}

function isEmptyValue(value: unknown): boolean {
  return value === null || value === '' || value === false || (Array.isArray(value) && value.length === 0);
}
