import { diffFields } from '@/lib/fields/field-diff';
import type { FieldChange } from '@/lib/templates/template';
import { BUILD_FIELD_KEYS, type BuildFields } from './build-fields';

/** The fields that differ between two states of a record, in the field table's order, old → new. */
export function diffBuildFields(before: Partial<BuildFields>, after: Partial<BuildFields>): FieldChange[] {
  return diffFields(BUILD_FIELD_KEYS, before, after);
}

const isEmpty = (value: unknown) => value === null || value === '' || (Array.isArray(value) && value.length === 0);

/** The changes that record a creation: every field that is set, from nothing. */
export function creationChanges(fields: BuildFields): FieldChange[] {
  return diffBuildFields({}, fields).filter((c) => !isEmpty(c.to));
}
