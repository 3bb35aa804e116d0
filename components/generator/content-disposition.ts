/**
 * The file name of a download from its Content-Disposition header (RFC 6266):
 * `filename*=UTF-8''…` wins over `filename="…"`. Path parts are stripped.
 */
export function fileNameFromContentDisposition(header: string | null, fallback: string): string {
  if (!header) return fallback;
  const extended = /filename\*\s*=\s*UTF-8''([^;]+)/i.exec(header);
  const plain = /filename\s*=\s*(?:"((?:[^"\\]|\\.)*)"|([^;]+))/.exec(header);
  let name: string | undefined;
  if (extended?.[1]) {
    try {
      name = decodeURIComponent(extended[1].trim());
    } catch {
      name = undefined;
    }
  }
  name ??= plain?.[1]?.replace(/\\(.)/g, '$1') ?? plain?.[2]?.trim();
  const safe = name?.split(/[\\/]/).pop()?.trim();
  return safe ? safe : fallback;
}
