import Papa from 'papaparse';
import { CSV_COLUMNS, CSV_COLUMN_SPECS, columnForField, type CsvColumnSpec } from './csv-columns';
import { detectDelimiter, type CsvDelimiter } from '@/lib/csv/detect-delimiter';
import { guardCell, unguardCell } from '@/lib/csv/formula-guard';
import {
  readBooleanCell,
  readListCell,
  readNumberCell,
  readPortsCell,
  writeListCell,
  writeNumberCell,
  writePortsCell,
  type CellResult,
  type NumberStyle,
} from './csv-cells';
import type { PortEvent } from '@/lib/sheet/sheet-request';
import { templateSchema, type TemplateFieldName, type TemplateFields } from './template-schema';

export const MAX_IMPORT_ROWS = 20_000;

/** One problem in an import: `row` is the spreadsheet row (the header is row 1). */
export type CsvProblem = { row: number; column: string; message: string };

export type CsvImportResult =
  | { ok: true; templates: TemplateFields[]; fields: TemplateFieldName[]; delimiter: CsvDelimiter }
  | { ok: false; problems: CsvProblem[] };

function readCell(spec: CsvColumnSpec, guarded: string, style: NumberStyle): CellResult<unknown> {
  // Every exported cell may carry the formula guard (templatesToCsv), so every cell loses it first.
  const cell = unguardCell(guarded);
  switch (spec.kind) {
    case 'number':
      return readNumberCell(cell, spec.column, style);
    case 'list':
      return readListCell(cell, spec.column, style);
    case 'ports':
      return readPortsCell(cell, spec.column, style);
    case 'boolean':
      return readBooleanCell(cell, spec.column);
    case 'choice':
      // An empty cell takes the field's default; a bad value is left to the schema's message.
      return { ok: true, value: cell.trim() === '' ? undefined : cell.trim().toLowerCase() };
    case 'text':
      return { ok: true, value: cell };
  }
}

function headerProblems(headers: string[]): CsvProblem[] {
  const problems: CsvProblem[] = [];
  const known = new Set<string>(CSV_COLUMNS);
  for (const header of headers)
    if (!known.has(header))
      problems.push({ row: 1, column: header, message: `Unknown column "${header}"; the columns are: ${CSV_COLUMNS.join(', ')}` });
  const seen = new Set<string>();
  for (const header of headers) {
    if (seen.has(header)) problems.push({ row: 1, column: header, message: `Column "${header}" appears twice` });
    seen.add(header);
  }
  if (!headers.includes('name')) problems.push({ row: 1, column: 'name', message: 'The header row must have a "name" column' });
  return problems;
}

function rowToTemplate(record: Record<string, string>, row: number, problems: CsvProblem[], style: NumberStyle): TemplateFields | null {
  const raw: Record<string, unknown> = {};
  let cellsOk = true;
  for (const spec of CSV_COLUMN_SPECS) {
    const cell = record[spec.column];
    if (cell === undefined) continue;
    const result = readCell(spec, cell, style);
    if (result.ok) raw[spec.field] = result.value;
    else {
      problems.push({ row, column: spec.column, message: result.message });
      cellsOk = false;
    }
  }
  const parsed = templateSchema.safeParse(raw);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = String(issue.path[0] ?? 'name');
      if (!cellsOk && raw[field] === undefined) continue; // already reported as an unreadable cell
      problems.push({ row, column: columnForField(field) ?? field, message: issue.message });
    }
    return null;
  }
  return cellsOk ? parsed.data : null;
}

/**
 * Reads a template CSV (column set in csv-columns.ts) separated by commas, semicolons or
 * tabs (detected from the header row); a semicolon file may write numbers with a decimal
 * comma. Every row is checked and every problem reported; templates come back only when
 * all rows pass.
 */
export function parseTemplatesCsv(source: string): CsvImportResult {
  const text = source.replace(/^\uFEFF/, '');
  const delimiter = detectDelimiter(text);
  const style: NumberStyle = { decimalComma: delimiter === ';' };
  const parsed = Papa.parse<Record<string, string>>(text, {
    header: true,
    delimiter,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  const headers = parsed.meta.fields ?? [];
  const problems = headerProblems(headers);
  for (const error of parsed.errors)
    problems.push({ row: (error.row ?? -1) + 2, column: '(row)', message: `CSV format: ${error.message}` });
  if (problems.length > 0) return { ok: false, problems };
  if (parsed.data.length === 0) return { ok: false, problems: [{ row: 2, column: '(row)', message: 'The file has no template rows' }] };
  if (parsed.data.length > MAX_IMPORT_ROWS)
    return { ok: false, problems: [{ row: MAX_IMPORT_ROWS + 2, column: '(row)', message: `At most ${MAX_IMPORT_ROWS} rows per import` }] };

  const templates: TemplateFields[] = [];
  parsed.data.forEach((record, index) => {
    const template = rowToTemplate(record, index + 2, problems, style);
    if (template) templates.push(template);
  });
  if (problems.length > 0) return { ok: false, problems };
  // The columns the file has: an update from it changes those fields and leaves the others alone.
  const fields = CSV_COLUMN_SPECS.filter((spec) => headers.includes(spec.column)).map((spec) => spec.field);
  return { ok: true, templates, fields, delimiter };
}

function writeCell(spec: CsvColumnSpec, value: unknown): string {
  switch (spec.kind) {
    case 'number':
      return writeNumberCell(value as number | null);
    case 'list':
      return writeListCell(value as number[]);
    case 'ports':
      return writePortsCell(value as PortEvent[]);
    case 'boolean':
      return value ? 'true' : 'false';
    case 'choice':
      return String(value);
    case 'text':
      return value as string;
  }
}

/** Writes templates in the documented column set, header first, CRLF line ends (RFC 4180), every cell formula-guarded. */
export function templatesToCsv(templates: TemplateFields[]): string {
  return Papa.unparse(
    { fields: [...CSV_COLUMNS], data: templates.map((t) => CSV_COLUMN_SPECS.map((spec) => guardCell(writeCell(spec, t[spec.field])))) },
    { newline: '\r\n', quotes: false, escapeFormulae: false },
  );
}
