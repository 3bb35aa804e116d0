import type { FieldChange } from '@/lib/templates/template';
import { BUILD_FIELD_KEYS, type BuildFields } from './build-fields';

const sameValue = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** The fields that differ between two states of a record, in the field table's order, old → new. */
export function diffBuildFields(before: Partial<BuildFields>, after: Partial<BuildFields>): FieldChange[] {
  const changes: FieldChange[] = [];
  for (const field of BUILD_FIELD_KEYS) {
    if (!(field in after)) continue;
    const from = before[field] ?? null;
    const to = after[field] ?? null;
    if (!sameValue(from, to)) changes.push({ field, from, to });
  }
  return changes;
}

const isEmpty = (value: unknown) => value === null || value === '' || (Array.isArray(value) && value.length === 0);

/** The changes that record a creation: every field that is set, from nothing. */
export function creationChanges(fields: BuildFields): FieldChange[] {
  return diffBuildFields({}, fields).filter((c) => !isEmpty(c.to));
}
