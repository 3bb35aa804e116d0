export const CSV_DELIMITERS = [',', ';', '\t'] as const;
export type CsvDelimiter = (typeof CSV_DELIMITERS)[number];

/**
 * The delimiter of a CSV with a header row: whichever of comma, semicolon and tab occurs most
 * in the first line outside quotes. Header names never contain any of them, so the header
 * tells reliably, while data cells (";"-separated lists, decimal commas) would mislead.
 * Comma wins ties (RFC 4180), which covers a one-column file.
 */
export function detectDelimiter(text: string): CsvDelimiter {
  const counts = new Map<string, number>();
  let quoted = false;
  for (const char of text) {
    if (char === '"') quoted = !quoted;
    else if (!quoted && (char === '\n' || char === '\r')) break;
    else if (!quoted) counts.set(char, (counts.get(char) ?? 0) + 1);
  }
  let best: CsvDelimiter = ',';
  for (const candidate of CSV_DELIMITERS) if ((counts.get(candidate) ?? 0) > (counts.get(best) ?? 0)) best = candidate;
  return best;
}

export const DELIMITER_NAMES: Record<CsvDelimiter, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab' };
