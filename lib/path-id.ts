/**
 * A database id taken from a URL segment: a positive whole number without leading zeros that a JavaScript number
 * holds exactly (at most 2^53 − 1), else null (answered as not found). The one reader of ids in paths.
 */
export function parsePathId(text: string): number | null {
  if (!/^[1-9]\d{0,15}$/.test(text)) return null;
  const id = Number(text);
  return Number.isSafeInteger(id) ? id : null;
}
