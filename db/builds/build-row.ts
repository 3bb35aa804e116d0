import { BUILD_FIELD_LIST, type BuildFields } from '@/lib/builds/build-fields';
import type { Build, BuildSend } from '@/lib/builds/build';
import type { BuildResults } from '@/lib/builds/build-results';
import type { VersionedRow } from '@/db/versioned-row';

/**
 * A row of the builds table and its mapping to the record's fields, read from the field
 * table: each field's `column`, lists stored as JSON text.
 */
export type BuildRow = Record<string, unknown> & VersionedRow & {
  finished_on: string | null;
  handed_over_on: string | null;
  results_json: string;
  technician_name?: string | null;
  template_name?: string | null;
};

function columnOf(field: (typeof BUILD_FIELD_LIST)[number]): string {
  if (!field.column) throw new Error(`Build field ${field.key} has no column`);
  return field.column;
}

export function rowToFields(row: BuildRow): BuildFields {
  const fields: Record<string, unknown> = {};
  for (const field of BUILD_FIELD_LIST) {
    const value = row[columnOf(field)];
    fields[field.key] = field.kind === 'list' ? (value === null ? null : JSON.parse(String(value))) : (value ?? null);
  }
  return fields as BuildFields;
}

/** The columns to write for the given fields (only those present). */
export function fieldsToColumns(fields: Partial<BuildFields>): Record<string, unknown> {
  const columns: Record<string, unknown> = {};
  for (const field of BUILD_FIELD_LIST) {
    if (!(field.key in fields)) continue;
    const value = fields[field.key as keyof BuildFields];
    columns[columnOf(field)] = field.kind === 'list' ? (value === null ? null : JSON.stringify(value)) : (value ?? null);
  }
  return columns;
}

/** Every field's SQL column by its key: the whitelist for sorting. */
export const BUILD_COLUMNS: Record<string, string> = {
  ...Object.fromEntries(BUILD_FIELD_LIST.map((f) => [f.key, columnOf(f)])),
  updatedAt: 'updated_at',
};

const userRef = (id: number | null, name: string | null | undefined) => (id === null ? null : { id, name: name ?? '' });

export function rowToBuild(row: BuildRow, sends: BuildSend[]): Build {
  const fields = rowToFields(row);
  const results = JSON.parse(row.results_json) as BuildResults;
  const { ports: _measured, timingSetDegBTDC: _deg, timingSetMmBTDC: _mm, ...rest } = fields;
  return {
    id: row.id,
    ...rest,
    ...results,
    technician: userRef(fields.technicianId, row.technician_name),
    template: fields.templateId === null ? null : { id: fields.templateId, name: row.template_name ?? '', version: fields.templateVersion },
    finishedOn: row.finished_on,
    handedOverOn: row.handed_over_on,
    sends,
    version: row.version,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    createdBy: userRef(row.created_by, row.created_by_name),
    updatedBy: userRef(row.updated_by, row.updated_by_name),
  };
}

