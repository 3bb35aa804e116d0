import type { SheetRequest } from './sheet-request';

const MAX_SLUG_CHARS = 40;

/** A title as a safe ASCII file-name part: accents dropped, anything else to single dashes. */
export function titleSlug(title: string): string {
  return title
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .slice(0, MAX_SLUG_CHARS)
    .replace(/^-+|-+$/g, '');
}

function sizePart(request: SheetRequest): string | undefined {
  const diameterMm = request.kind === 'ring' ? request.outerDiameterMm : request.diameterMm;
  return diameterMm === undefined ? undefined : `${Number(diameterMm.toFixed(2))}mm`;
}

/** `rimscale-<kind>-<diameter>mm-<title slug>.<format>`, parts left out when empty. */
export function sheetFileName(request: SheetRequest): string {
  const parts = ['rimscale', request.kind, sizePart(request), titleSlug(request.title)].filter(Boolean);
  return `${parts.join('-')}.${request.format}`;
}
