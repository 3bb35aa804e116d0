/** How a link or a list field's text becomes numbers (no schema here: the browser's form reads it on first paint). */

/** A strict decimal number: "", "1e3", "0x10" and "12abc" are not numbers here. */
export function parseDecimal(text: string): number {
  const trimmed = text.trim();
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

/** "16, 17,18" → [16, 17, 18]; blanks between commas are skipped, bad entries become NaN. */
export function parseNumberList(text: string): number[] {
  return text
    .split(',')
    .map((part) => part.trim())
    .filter((part) => part !== '')
    .map(parseDecimal);
}
