import { createHash } from 'node:crypto';
import { beforeEach, describe, expect, it, vi } from 'vitest';

// A 1 MiB cache, so a few bodies of 300 kB overflow it.
vi.stubEnv('RIMSCALE_SHEET_CACHE_MB', '1');
const { cachedSheet, clearSheetCache, matchesIfNoneMatch, sheetCacheKey, strongEtag } = await import('@/app/lib/sheet-cache');

beforeEach(() => clearSheetCache());

const drawn = (fill: number, bytes = 300_000) => ({ body: new Uint8Array(bytes).fill(fill), notes: [] });

describe('the sheet cache', () => {
  it('draws a key once: a repeat and a concurrent twin get the first drawing', async () => {
    const draw = vi.fn(async () => drawn(1));
    const [a, b] = await Promise.all([cachedSheet('k', draw), cachedSheet('k', draw)]);
    const c = await cachedSheet('k', draw);
    expect(draw).toHaveBeenCalledTimes(1);
    expect(b).toBe(a);
    expect(c).toBe(a);
  });

  it('stays within its byte budget, dropping the least recently used sheet first', async () => {
    const draws = new Map<string, number>();
    const get = (key: string) =>
      cachedSheet(key, async () => {
        draws.set(key, (draws.get(key) ?? 0) + 1);
        return drawn(key.charCodeAt(0));
      });
    await get('a');
    await get('b');
    await get('c');
    await get('a'); // a is now the most recent; b the least
    await get('d'); // 4 × 300 kB > 1 MiB: one must go
    await get('a');
    await get('b');
    expect(draws.get('a')).toBe(1);
    expect(draws.get('b')).toBe(2);
  });

  it('keys a request by content, not by key order; the day and the record version change the key', () => {
    const key = sheetCacheKey({ request: { kind: 'wheel', diameterMm: 100, advanceMarksDeg: [16, 18] }, day: '2026-03-14' });
    expect(sheetCacheKey({ day: '2026-03-14', request: { advanceMarksDeg: [16, 18], diameterMm: 100, kind: 'wheel' } })).toBe(key);
    expect(sheetCacheKey({ request: { kind: 'wheel', diameterMm: 100, advanceMarksDeg: [18, 16] }, day: '2026-03-14' })).not.toBe(key);
    expect(sheetCacheKey({ request: { kind: 'wheel', diameterMm: 100, advanceMarksDeg: [16, 18] }, day: '2026-03-15' })).not.toBe(key);
    const v1 = sheetCacheKey({ request: { kind: 'wheel' }, day: '2026-03-14', record: 'template:7@v1' });
    expect(sheetCacheKey({ request: { kind: 'wheel' }, day: '2026-03-14', record: 'template:7@v2' })).not.toBe(v1);
  });

  it('makes a strong ETag from the bytes: a quoted SHA-256 prefix, checked against node:crypto', () => {
    const bytes = Buffer.from('%PDF-1.3 sheet');
    const expected = createHash('sha256').update(bytes).digest('base64url').slice(0, 32);
    expect(strongEtag(bytes)).toBe(`"${expected}"`);
  });

  it('reads If-None-Match as RFC 9110 §13.1.2 writes it: a list, weak comparison, or *', () => {
    expect(matchesIfNoneMatch('"x", "y"', '"y"')).toBe(true);
    expect(matchesIfNoneMatch('W/"y"', '"y"')).toBe(true);
    expect(matchesIfNoneMatch('*', '"y"')).toBe(true);
    expect(matchesIfNoneMatch('"x"', '"y"')).toBe(false);
    expect(matchesIfNoneMatch(null, '"y"')).toBe(false);
  });
});
