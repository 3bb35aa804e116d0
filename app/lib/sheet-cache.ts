import 'server-only';
import { createHash } from 'node:crypto';
import { LRUCache } from 'lru-cache';

/**
 * Drawn sheets kept in memory: a sheet is a pure function of its validated request,
 * its day and (for a stored record) the record's version, so a repeat is served
 * from here. Least recently used first out, bounded by the bytes of the bodies.
 */

/** A drawn sheet: its bytes, their ETag, and the layout's notes (what it could not draw as asked). */
export type CachedSheet = { body: Buffer; etag: string; notes: string[] };
export type DrawnSheet = { body: Uint8Array | string; notes: string[] };

const MAX_BYTES = (Number(process.env.RIMSCALE_SHEET_CACHE_MB) || 32) * 1024 * 1024;
const ENTRY_OVERHEAD_BYTES = 200; // key, ETag and bookkeeping, so tiny bodies still count

/** JSON with keys sorted at every level, so equal requests give equal keys whatever their key order. */
function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
    entries.sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** The cache key of a sheet: what it is drawn from, hashed. `record` names a stored record and its version. */
export function sheetCacheKey(parts: { request: object; day: string; locale?: string; record?: string }): string {
  return createHash('sha256').update(canonicalJson(parts)).digest('base64url');
}

/** A strong validator (RFC 9110 §8.8.3) from the bytes themselves: equal bodies, equal ETags, whatever made them. */
export function strongEtag(body: Buffer): string {
  return `"${createHash('sha256').update(body).digest('base64url').slice(0, 32)}"`;
}

const CACHE = Symbol.for('rimscale.sheet.cache');
const IN_FLIGHT = Symbol.for('rimscale.sheet.inFlight');
type CacheGlobal = typeof globalThis & { [CACHE]?: LRUCache<string, CachedSheet>; [IN_FLIGHT]?: Map<string, Promise<CachedSheet>> };

function store(): { cache: LRUCache<string, CachedSheet>; inFlight: Map<string, Promise<CachedSheet>> } {
  const global = globalThis as CacheGlobal;
  global[CACHE] ??= new LRUCache<string, CachedSheet>({
    maxSize: MAX_BYTES,
    maxEntrySize: MAX_BYTES / 2,
    sizeCalculation: (entry) => entry.body.byteLength + ENTRY_OVERHEAD_BYTES,
  });
  global[IN_FLIGHT] ??= new Map();
  return { cache: global[CACHE], inFlight: global[IN_FLIGHT] };
}

/**
 * The cached sheet for `key`, or `draw()`'s, stored. Identical requests that arrive
 * while the first is still drawing wait for it instead of drawing again.
 */
export async function cachedSheet(key: string, draw: () => Promise<DrawnSheet>): Promise<CachedSheet> {
  const { cache, inFlight } = store();
  const hit = cache.get(key);
  if (hit) return hit;
  const pending = inFlight.get(key);
  if (pending) return pending;
  const drawing = (async () => {
    const drawn = await draw();
    const body = typeof drawn.body === 'string' ? Buffer.from(drawn.body, 'utf8') : Buffer.from(drawn.body.buffer, drawn.body.byteOffset, drawn.body.byteLength);
    const entry = { body, etag: strongEtag(body), notes: drawn.notes };
    cache.set(key, entry);
    return entry;
  })();
  inFlight.set(key, drawing);
  try {
    return await drawing;
  } finally {
    inFlight.delete(key);
  }
}

/** Whether an If-None-Match header names this ETag (RFC 9110 §13.1.2: weak comparison, `*` matches any). */
export function matchesIfNoneMatch(header: string | null, etag: string): boolean {
  if (!header) return false;
  if (header.trim() === '*') return true;
  const opaque = (tag: string) => tag.trim().replace(/^W\//, '');
  return header.split(',').some((tag) => opaque(tag) === opaque(etag));
}

/** Empties the cache (tests). */
export function clearSheetCache(): void {
  store().cache.clear();
}
