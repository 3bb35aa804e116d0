import type { PrinterProfile } from './printer-profile';

/**
 * "X 0.98 · Y 1.00" — how a profile is shown next to its name. Apart from the profile's schema (printer-profile.ts),
 * so the sheet maker's download panel shows its profiles without loading the schema library.
 */
export function describeScale(profile: Pick<PrinterProfile, 'printerScaleX' | 'printerScaleY'>): string {
  return `X ${profile.printerScaleX.toFixed(3)} · Y ${profile.printerScaleY.toFixed(3)}`;
}
