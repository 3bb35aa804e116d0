'use client';

import { useSyncExternalStore } from 'react';
import type { PrinterProfile } from '@/lib/printer-profile';
import { readProfiles, serverProfiles, subscribeProfiles } from './printer-profile-store';

/** The stored printer profiles, newest first; empty during server rendering. */
export function usePrinterProfiles(): PrinterProfile[] {
  return useSyncExternalStore(subscribeProfiles, readProfiles, serverProfiles);
}
