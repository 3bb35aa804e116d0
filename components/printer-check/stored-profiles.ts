import { z } from 'zod';
import { printerProfileSchema, type PrinterProfile } from '@/lib/printer-profile';

/** The printer profiles kept in the browser, checked with the profile schema: damaged entries are skipped, never thrown. */
export function parseStoredProfiles(raw: string): PrinterProfile[] {
  try {
    const list = z.array(z.unknown()).parse(JSON.parse(raw));
    return list.flatMap((entry) => {
      const result = printerProfileSchema.safeParse(entry);
      return result.success ? [result.data] : [];
    });
  } catch {
    return [];
  }
}
