import type { PortEvent } from '@/lib/sheet/sheet-request';

/** Reading and writing one CSV cell of each column kind (see csv-columns.ts). */

export type CellResult<T> = { ok: true; value: T } | { ok: false; message: string };

const NUMBER_PATTERN = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const DECIMAL_COMMA_PATTERN = /^[+-]?\d+,\d+$/;

/**
 * How numbers are written in the file: "." always; "," too in a semicolon-separated file,
 * which is what spreadsheet programs write where the comma is the decimal mark.
 */
export type NumberStyle = { decimalComma: boolean };
const POINT_ONLY: NumberStyle = { decimalComma: false };

function parseNumber(text: string, style: NumberStyle): number | null {
  if (NUMBER_PATTERN.test(text)) return Number(text);
  if (style.decimalComma && DECIMAL_COMMA_PATTERN.test(text)) return Number(text.replace(',', '.'));
  return null;
}

const decimalMark = (style: NumberStyle) => (style.decimalComma ? '"." or "," as decimal mark' : '"." as decimal point');

export function readNumberCell(cell: string, column: string, style: NumberStyle = POINT_ONLY): CellResult<number | null> {
  const text = cell.trim();
  if (text === '') return { ok: true, value: null };
  const value = parseNumber(text, style);
  if (value === null) return { ok: false, message: `${column} must be a number with ${decimalMark(style)}; got "${text}"` };
  return { ok: true, value };
}

export function readListCell(cell: string, column: string, style: NumberStyle = POINT_ONLY): CellResult<number[]> {
  const parts = cell.split(';').map((p) => p.trim()).filter((p) => p !== '');
  const values: number[] = [];
  for (const part of parts) {
    const value = parseNumber(part, style);
    if (value === null)
      return { ok: false, message: `${column} must be numbers separated by ";" (e.g. 16;18;20); got "${part}"` };
    values.push(value);
  }
  return { ok: true, value: values };
}

export function readPortsCell(cell: string, column: string, style: NumberStyle = POINT_ONLY): CellResult<PortEvent[]> {
  const parts = cell.split(';').map((p) => p.trim()).filter((p) => p !== '');
  const ports: PortEvent[] = [];
  for (const part of parts) {
    const match = /^(.+?):\s*([^/]+)\/(.+)$/.exec(part);
    const opens = match ? readNumberCell(match[2]!, column, style) : null;
    const closes = match ? readNumberCell(match[3]!, column, style) : null;
    if (!match || !opens?.ok || !closes?.ok || opens.value === null || closes.value === null)
      return { ok: false, message: `${column} must be name:opens/closes separated by ";" (e.g. exhaust:92/268); got "${part}"` };
    ports.push({ name: match[1]!.trim(), opensCrankDeg: opens.value, closesCrankDeg: closes.value });
  }
  return { ok: true, value: ports };
}

export function readBooleanCell(cell: string, column: string): CellResult<boolean> {
  const text = cell.trim().toLowerCase();
  if (text === '' || text === 'false' || text === 'no' || text === '0') return { ok: true, value: false };
  if (text === 'true' || text === 'yes' || text === '1') return { ok: true, value: true };
  return { ok: false, message: `${column} must be true or false; got "${cell.trim()}"` };
}

export function writeNumberCell(value: number | null): string {
  return value === null ? '' : String(value);
}

export function writeListCell(values: number[]): string {
  return values.map(String).join(';');
}

export function writePortsCell(ports: PortEvent[]): string {
  return ports.map((p) => `${p.name}:${p.opensCrankDeg}/${p.closesCrankDeg}`).join(';');
}
