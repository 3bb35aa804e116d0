/**
 * The words of a template search: split at spaces and hyphens (or dashes), so "piston port" finds
 * "piston-port" and the other way round. Every word must appear (in the name or the engine), in any order.
 */
export function searchWords(query: string): string[] {
  return query
    .split(/[\s\-‐–—]+/u)
    .map((word) => word.trim())
    .filter((word) => word !== '');
}
