/** How the calculators read what is typed; lengths and their units are lib/fields/length.ts, figures lib/format/number-format.ts. */

/** "2.5", "2,5" and " 2.5 " are 2.5; anything else (blank, "2.5mm", "1e3") is NaN, which the schema names. */
export function parseTypedNumber(text: string): number {
  const trimmed = text.trim().replace(',', '.');
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}
