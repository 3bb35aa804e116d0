import { KEEP_PARAM } from '@/lib/sheet-link-params';
import type { SheetRequestInput } from '@/lib/sheet/sheet-request';

/** Fields the generator on `/` reads from its query string (see lib/generator-prefill.ts), in a stable order. */
const PREFILL_FIELDS = [
  'kind',
  'diameterMm',
  'hubHoleMm',
  'innerDiameterMm',
  'outerDiameterMm',
  'rotation',
  'carrier',
  'numbering',
  'advanceMarksDeg',
  'portEvents',
  'title',
  'note',
] as const;

function encodeValue(field: (typeof PREFILL_FIELDS)[number], value: unknown): string | null {
  if (value === undefined || value === null) return null;
  if (field === 'advanceMarksDeg') return (value as number[]).length > 0 ? (value as number[]).join(',') : null;
  if (field === 'portEvents') return (value as unknown[]).length > 0 ? JSON.stringify(value) : null;
  if (field === 'hubHoleMm' && value === 0) return null;
  if (typeof value === 'string' && value === '') return null;
  return String(value);
}

/**
 * A link to the generator filled in from a sheet request: `/?keep=1&kind=strip&diameterMm=…`. `keep` adds these
 * fields to the user's last sheet (paper, orientation, pitch and unit stay as they were; lib/sheet-link.ts).
 */
export function generatorHref(request: SheetRequestInput): string {
  const params = new URLSearchParams({ [KEEP_PARAM]: '1' });
  for (const field of PREFILL_FIELDS) {
    const encoded = encodeValue(field, request[field]);
    if (encoded !== null) params.set(field, encoded);
  }
  return `/?${params.toString()}`;
}
