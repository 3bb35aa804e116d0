/**
 * Spreadsheet formula guard for every cell the app writes to a CSV (OWASP "CSV injection"):
 * a cell starting with = + - @ tab or CR would be run as a formula when the file is opened,
 * so it gets a leading '. A plain number such as -5 stays as it is (it is no formula).
 * A cell already starting with ' gets one more, so reading strips exactly one.
 */

const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

export function guardCell(cell: string): string {
  if (cell.startsWith("'")) return `'${cell}`;
  return FORMULA_START.test(cell) && !PLAIN_NUMBER.test(cell) ? `'${cell}` : cell;
}

/** The cell as it was before guardCell: one leading ' comes off when guardCell would have added it. */
export function unguardCell(cell: string): string {
  if (!cell.startsWith("'")) return cell;
  const rest = cell.slice(1);
  return rest.startsWith("'") || FORMULA_START.test(rest) ? rest : cell;
}
