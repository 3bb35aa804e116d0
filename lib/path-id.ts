/** A database id taken from a URL segment: a positive whole number without leading zeros, else null (answered as not found). */
export function parsePathId(text: string): number | null {
  return /^[1-9]\d{0,15}$/.test(text) ? Number(text) : null;
}
