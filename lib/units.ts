/** Unit constants shared by every computation. Radians live only in lib/angle.ts. */
/** The unit lengths are typed and shown in; every computation stays in mm. */
export type LengthUnit = 'mm' | 'in';

export const MM_PER_INCH = 25.4; // exact by definition (international inch, 1959)
export const PT_PER_INCH = 72; // ISO 32000-1 §8.3.2.3: default user space unit is 1/72 inch
export const PT_PER_MM = PT_PER_INCH / MM_PER_INCH;

export function mmToPt(mm: number): number {
  return mm * PT_PER_MM;
}

export function mmToInch(mm: number): number {
  return mm / MM_PER_INCH;
}
