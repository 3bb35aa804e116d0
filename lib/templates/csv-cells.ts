import type { PortEvent } from '@/lib/sheet/sheet-request';

/** Reading and writing one CSV cell of each column kind (see csv-columns.ts). */

export type CellResult<T> = { ok: true; value: T } | { ok: false; message: string };

const NUMBER_PATTERN = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const FORMULA_START = /^[=+\-@\t\r]/;

export function readNumberCell(cell: string, column: string): CellResult<number | null> {
  const text = cell.trim();
  if (text === '') return { ok: true, value: null };
  if (!NUMBER_PATTERN.test(text)) return { ok: false, message: `${column} must be a number with "." as decimal point; got "${text}"` };
  return { ok: true, value: Number(text) };
}

export function readListCell(cell: string, column: string): CellResult<number[]> {
  const parts = cell.split(';').map((p) => p.trim()).filter((p) => p !== '');
  const values: number[] = [];
  for (const part of parts) {
    if (!NUMBER_PATTERN.test(part))
      return { ok: false, message: `${column} must be numbers separated by ";" (e.g. 16;18;20); got "${part}"` };
    values.push(Number(part));
  }
  return { ok: true, value: values };
}

export function readPortsCell(cell: string, column: string): CellResult<PortEvent[]> {
  const parts = cell.split(';').map((p) => p.trim()).filter((p) => p !== '');
  const ports: PortEvent[] = [];
  for (const part of parts) {
    const match = /^(.+?):\s*([^/]+)\/(.+)$/.exec(part);
    const opens = match ? readNumberCell(match[2]!, column) : null;
    const closes = match ? readNumberCell(match[3]!, column) : null;
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

/** Text cells: the leading ' of the export's formula guard comes off again. */
export function readTextCell(cell: string): string {
  return cell.startsWith("'") && (FORMULA_START.test(cell.slice(1)) || cell[1] === "'") ? cell.slice(1) : cell;
}

/** A text that would start a spreadsheet formula gets a leading '; so does one already starting with ' (to round-trip). */
export function writeTextCell(text: string): string {
  return FORMULA_START.test(text) || text.startsWith("'") ? `'${text}` : text;
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
