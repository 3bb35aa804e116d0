import type { Field } from '@/lib/fields/field';
import { rangeText } from '@/lib/fields/range-text';
import { TEMPLATE_FIELD_LIST, type TemplateFieldName } from './template-fields';

/**
 * The template CSV column set (import and export), one row per template, units
 * in the headers: every field of the table with a `csvColumn`, in table order.
 * The header row is required; columns may come in any order and all but `name`
 * may be left out (a missing column or an empty cell means "not known" for
 * measurements and the default otherwise). Lists are ";"-separated. Decimal
 * point is "."; text cells that start with = + - @ are written with a leading '
 * (spreadsheet formula guard) and read back without it.
 */

export type CsvColumnKind = 'text' | 'number' | 'choice' | 'list' | 'ports' | 'boolean';

export type CsvColumnSpec = { column: string; field: TemplateFieldName; kind: CsvColumnKind; meaning: string };

const PORTS_FORMAT = 'name:opens/closes in crank degrees (0 = TDC, counting the way the engine turns, 0–360), ";"-separated, e.g. exhaust:92/268';

function cellKind(field: Field): CsvColumnKind {
  switch (field.kind) {
    case 'number':
    case 'length':
      return 'number';
    case 'flag':
      return 'boolean';
    case 'list':
      // A list of port events is written name:opens/closes; every other list is plain numbers.
      return field.unit === '' ? 'ports' : 'list';
    default:
      return field.kind;
  }
}

/** "Bore, 10–150 mm", "Rotation: cw or ccw. As seen from…": the import page's column table. */
function meaning(field: Field, kind: CsvColumnKind): string {
  const help = field.help ? `. ${field.help}` : '';
  switch (kind) {
    case 'text':
      return `${field.label}, ${field.required ? `1–${field.maxLength} characters (required)` : `up to ${field.maxLength} characters`}`;
    case 'number':
      return `${field.label}, ${rangeText(field.min ?? 0, field.max ?? 0, field.unit)}${help}`;
    case 'choice':
      return `${field.label}: ${field.choices?.join(' or ')}${help}`;
    case 'boolean':
      return `${field.label}: true or false`;
    case 'list':
      return `${field.label} in ${field.unit}, ";"-separated, e.g. 16;18;20`;
    case 'ports':
      return `${field.label}: ${PORTS_FORMAT}`;
  }
}

export const CSV_COLUMN_SPECS: readonly CsvColumnSpec[] = TEMPLATE_FIELD_LIST.flatMap((field) => {
  if (!field.csvColumn) return [];
  const kind = cellKind(field);
  return [{ column: field.csvColumn, field: field.key as TemplateFieldName, kind, meaning: meaning(field, kind) }];
});

export const CSV_COLUMNS: readonly string[] = CSV_COLUMN_SPECS.map((spec) => spec.column);

export function columnForField(field: string): string | undefined {
  return CSV_COLUMN_SPECS.find((s) => s.field === field)?.column;
}
