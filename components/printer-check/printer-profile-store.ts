import type { PrinterProfile } from '@/lib/printer-profile';

/**
 * Where printer profiles live: the browser's localStorage for now. Everything
 * that reads or writes profiles goes through this module, so keeping them in a
 * signed-in workspace later means changing only this file.
 * The schema that checks stored profiles (stored-profiles.ts, with zod) is loaded
 * only when there are profiles to read: the sheet maker's first visit, with none,
 * does not download it. Until it has loaded the list reads as empty, and the
 * listeners hear when it is read.
 */

const STORAGE_KEY = 'rimscale.printer-profiles.v1';
const MAX_PROFILES = 20;
const EMPTY: PrinterProfile[] = [];

const listeners = new Set<() => void>();
let cachedRaw: string | null | undefined;
let cachedProfiles: PrinterProfile[] = EMPTY;

let parseStored: ((raw: string) => PrinterProfile[]) | undefined;
let loadingReader: Promise<void> | undefined;

function loadReader(): Promise<void> {
  loadingReader ??= import('./stored-profiles').then(({ parseStoredProfiles }) => {
    parseStored = parseStoredProfiles;
    listeners.forEach((listener) => listener());
  });
  return loadingReader;
}

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
  if (raw && !parseStored) {
    void loadReader();
    return cachedProfiles;
  }
  cachedRaw = raw;
  cachedProfiles = raw && parseStored ? parseStored(raw) : EMPTY;
  return cachedProfiles;
}

/** The stored profiles for a change: waits for the reader, so a write never drops profiles it has not read. */
async function profilesToChange(): Promise<PrinterProfile[]> {
  await loadReader();
  return readProfiles();
}

function writeProfiles(profiles: PrinterProfile[]) {
  storage()?.setItem(STORAGE_KEY, JSON.stringify(profiles.slice(0, MAX_PROFILES)));
  listeners.forEach((listener) => listener());
}

export async function saveProfile(profile: Pick<PrinterProfile, 'name' | 'printerScaleX' | 'printerScaleY'>): Promise<PrinterProfile> {
  const stored: PrinterProfile = {
    ...profile,
    id: typeof crypto !== 'undefined' && 'randomUUID' in crypto ? crypto.randomUUID() : `p${Date.now()}`,
    createdAt: new Date().toISOString(),
  };
  const others = (await profilesToChange()).filter((existing) => existing.name !== stored.name);
  writeProfiles([stored, ...others]);
  return stored;
}

export async function deleteProfile(id: string): Promise<void> {
  writeProfiles((await profilesToChange()).filter((profile) => profile.id !== id));
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
