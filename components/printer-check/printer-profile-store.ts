import { z } from 'zod';
import { printerProfileSchema, type PrinterProfile } from '@/lib/printer-profile';

/**
 * Where printer profiles live: the browser's localStorage for now. Everything
 * that reads or writes profiles goes through this module, so keeping them in a
 * signed-in workspace later means changing only this file.
 */

const STORAGE_KEY = 'rimscale.printer-profiles.v1';
const MAX_PROFILES = 20;
const EMPTY: PrinterProfile[] = [];

const listeners = new Set<() => void>();
let cachedRaw: string | null | undefined;
let cachedProfiles: PrinterProfile[] = EMPTY;

function storage(): Storage | undefined {
  try {
    return typeof window === 'undefined' ? undefined : window.localStorage;
  } catch {
    return undefined; // storage disabled by the browser's privacy settings
  }
}

/** Stored profiles, newest first; damaged entries are skipped, never thrown. */
export function readProfiles(): PrinterProfile[] {
  const raw = storage()?.getItem(STORAGE_KEY) ?? null;
  if (raw === cachedRaw) return cachedProfiles;
  cachedRaw = raw;
  cachedProfiles = parseStored(raw);
  return cachedProfiles;
}

function parseStored(raw: string | null): PrinterProfile[] {
  if (!raw) return EMPTY;
  try {
    const list = z.array(z.unknown()).parse(JSON.parse(raw));
    return list.flatMap((entry) => {
      const result = printerProfileSchema.safeParse(entry);
      return result.success ? [result.data] : [];
    });
  } catch {
    return EMPTY;
  }
}

function writeProfiles(profiles: PrinterProfile[]) {
  storage()?.setItem(STORAGE_KEY, JSON.stringify(profiles.slice(0, MAX_PROFILES)));
  listeners.forEach((listener) => listener());
}

export function saveProfile(profile: Pick<PrinterProfile, 'name' | 'printerScaleX' | 'printerScaleY'>): PrinterProfile {
  const stored: PrinterProfile = {
    ...profile,
    id: typeof crypto !== 'undefined' && 'randomUUID' in crypto ? crypto.randomUUID() : `p${Date.now()}`,
    createdAt: new Date().toISOString(),
  };
  const others = readProfiles().filter((existing) => existing.name !== stored.name);
  writeProfiles([stored, ...others]);
  return stored;
}

export function deleteProfile(id: string) {
  writeProfiles(readProfiles().filter((profile) => profile.id !== id));
}

/** Calls back when profiles change here or in another tab. */
export function subscribeProfiles(listener: () => void): () => void {
  listeners.add(listener);
  const onStorage = (event: StorageEvent) => {
    if (event.key === STORAGE_KEY) listener();
  };
  window.addEventListener('storage', onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', onStorage);
  };
}

export function serverProfiles(): PrinterProfile[] {
  return EMPTY;
}
