import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';

// The browser's localStorage as the WHATWG HTML standard defines it (Web Storage: getItem answers the stored string or
// null, setItem stores a string), held in a Map; `window` is what the store reads it from.
const STORAGE_KEY = 'rimscale.printer-profiles.v1';

function fakeWindow(initial: Record<string, string>) {
  const items = new Map(Object.entries(initial));
  const localStorage = {
    getItem: (key: string) => items.get(key) ?? null,
    setItem: (key: string, value: string) => void items.set(key, value),
  };
  return { localStorage, addEventListener: () => {}, removeEventListener: () => {}, items };
}

const stored = [
  { id: 'a', name: 'Workshop laser', printerScaleX: 0.98, printerScaleY: 1, createdAt: '2026-01-02T10:00:00.000Z' },
  { id: 'b', name: 'Office inkjet', printerScaleX: 1.01, printerScaleY: 0.99, createdAt: '2026-01-01T10:00:00.000Z' },
  { id: 'c', name: 'Damaged', printerScaleX: 7 }, // outside the schema's 0.9–1.1 and incomplete: skipped
];

describe('printer profile store (schema loaded on first need)', () => {
  let window: ReturnType<typeof fakeWindow>;

  beforeEach(() => {
    vi.resetModules();
    window = fakeWindow({ [STORAGE_KEY]: JSON.stringify(stored) });
    vi.stubGlobal('window', window);
  });
  afterEach(() => vi.unstubAllGlobals());

  it('reads as empty until the schema has loaded, then tells its listeners and reads the valid profiles', async () => {
    const store = await import('@/components/printer-check/printer-profile-store');
    const heard = new Promise<void>((resolve) => store.subscribeProfiles(resolve));
    expect(store.readProfiles()).toEqual([]);
    await heard;
    expect(store.readProfiles().map((profile) => profile.name)).toEqual(['Workshop laser', 'Office inkjet']);
  });

  it('a save before the first read keeps the stored profiles: it waits for the schema instead of writing over them', async () => {
    const store = await import('@/components/printer-check/printer-profile-store');
    const saved = await store.saveProfile({ name: 'Bench laser', printerScaleX: 0.995, printerScaleY: 1.002 });
    const written = JSON.parse(window.items.get(STORAGE_KEY) ?? '[]') as Array<{ name: string }>;
    expect(written.map((profile) => profile.name)).toEqual(['Bench laser', 'Workshop laser', 'Office inkjet']);
    expect(saved.name).toBe('Bench laser');
  });

  it('a delete before the first read removes only the chosen profile', async () => {
    const store = await import('@/components/printer-check/printer-profile-store');
    await store.deleteProfile('a');
    expect(store.readProfiles().map((profile) => profile.id)).toEqual(['b']);
  });
});
