import { MM_PER_INCH, type LengthUnit } from '@/lib/units';

export type { LengthUnit };

export function toUnit(mm: number, unit: LengthUnit): number {
  return unit === 'in' ? mm / MM_PER_INCH : mm;
}

export function fromUnit(value: number, unit: LengthUnit): number {
  return unit === 'in' ? value * MM_PER_INCH : value;
}

/** A length for reading: mm to 0.001 (dial gauge resolution), inches to 0.0001. */
export function formatLength(mm: number, unit: LengthUnit): string {
  const places = unit === 'in' ? 4 : 3;
  return `${toUnit(mm, unit).toFixed(places)} ${unit}`;
}

export function formatDeg(deg: number, places = 2): string {
  return `${deg.toFixed(places)}°`;
}

/** "2.5", "2,5" and " 2.5 " are 2.5; anything else (blank, "2.5mm", "1e3") is NaN, which the schema names. */
export function parseTypedNumber(text: string): number {
  const trimmed = text.trim().replace(',', '.');
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

/** The text a field shows for a value in mm: trailing zeros dropped, blank for no value. */
export function lengthText(mm: number, unit: LengthUnit): string {
  if (!Number.isFinite(mm)) return '';
  return String(Number(toUnit(mm, unit).toFixed(unit === 'in' ? 4 : 3)));
}
