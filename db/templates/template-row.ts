import { TEMPLATE_SORT_KEYS, type TemplateSortKey } from '@/lib/templates/list-query';
import type { Template } from '@/lib/templates/template';
import { TEMPLATE_FIELD_LIST, type TemplateFieldName } from '@/lib/templates/template-fields';
import type { TemplateFields } from '@/lib/templates/template-schema';
import type { VersionedRow } from '@/db/versioned-row';

/**
 * A row of the templates table, joined with the names of its creator and last
 * editor: the bookkeeping columns of db/versioned-row.ts, plus one column per field of the field
 * table (lib/templates/template-fields.ts), read and written through `column`.
 */
export type TemplateRow = VersionedRow & Record<string, unknown>;

/** API field → SQL column, from the field table; the whitelist for sorting and for writes. */
export const FIELD_COLUMNS = Object.fromEntries(TEMPLATE_FIELD_LIST.map((field) => [field.key, field.column!])) as Record<TemplateFieldName, string>;

/** Every column the API names: the fields, the version and the timestamps. */
const API_COLUMNS: Record<TemplateSortKey, string> = { ...FIELD_COLUMNS, version: 'version', createdAt: 'created_at', updatedAt: 'updated_at' };

/** Sort key → SQL column: exactly the sortable keys, so nothing else can reach ORDER BY. */
export const SORT_COLUMNS = Object.fromEntries(TEMPLATE_SORT_KEYS.map((key) => [key, API_COLUMNS[key]])) as Record<TemplateSortKey, string>;

/** Lists are stored as JSON text, flags as 0/1; everything else as it is. */
export function rowToFields(row: TemplateRow): TemplateFields {
  const fields: Record<string, unknown> = {};
  for (const field of TEMPLATE_FIELD_LIST) {
    const value = row[field.column!];
    fields[field.key] = field.kind === 'list' ? JSON.parse(String(value)) : field.kind === 'flag' ? Boolean(value) : value;
  }
  return fields as TemplateFields;
}

export function rowToTemplate(row: TemplateRow): Template {
  return {
    id: row.id,
    ...rowToFields(row),
    version: row.version,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    createdBy: row.created_by === null ? null : { id: row.created_by, name: row.created_by_name ?? '' },
    updatedBy: row.updated_by === null ? null : { id: row.updated_by, name: row.updated_by_name ?? '' },
  };
}

/** The columns to write for the given fields (only those present). */
export function fieldsToColumns(fields: Partial<TemplateFields>): Record<string, unknown> {
  const columns: Record<string, unknown> = {};
  for (const field of TEMPLATE_FIELD_LIST) {
    if (!(field.key in fields)) continue;
    const value = fields[field.key as TemplateFieldName];
    if (field.kind === 'list') columns[field.column!] = JSON.stringify(value ?? []);
    else if (field.kind === 'flag') columns[field.column!] = value ? 1 : 0;
    else columns[field.column!] = value ?? null;
  }
  return columns;
}
