import { MM_PER_INCH } from './fields/length';

/** Unit constants shared by every computation. Radians live only in lib/angle.ts; mm ↔ inch in lib/fields/length.ts. */
export const PT_PER_INCH = 72; // ISO 32000-1 §8.3.2.3: default user space unit is 1/72 inch
export const PT_PER_MM = PT_PER_INCH / MM_PER_INCH;

export function mmToPt(mm: number): number {
  return mm * PT_PER_MM;
}
