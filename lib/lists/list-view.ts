import type { z } from 'zod';

/** A list page's view as its URL holds it: read, written and linked from the API's own list-query schema. */
export type ListViewCodec<V> = {
  /** The view with no parameters: the API's defaults. */
  defaults: V;
  /** One parameter at a time: a link with one bad value (`?sort=colour`) keeps the others and shows that one's default. */
  fromParams: (params: URLSearchParams) => V;
  /** Defaults left out (the plain list keeps a plain URL), always in the order of `keys`; the search text trimmed. */
  toParams: (view: V) => URLSearchParams;
  /** The page's own URL for a view (`/w/x/templates` for the default view). */
  href: (pathname: string, view: V) => string;
};

/** The codec of a view made of `keys` of a list-query schema's `shape` (templates, build records). */
export function listViewCodec<V extends { q: string }>(shape: Record<string, z.ZodType>, keys: ReadonlyArray<keyof V & string>): ListViewCodec<V> {
  const field = (key: keyof V & string) => shape[key]!;
  const defaults = Object.fromEntries(keys.map((key) => [key, field(key).safeParse(undefined).data])) as V;

  const parsedOrDefault = (key: keyof V & string, raw: string | null): unknown => {
    if (raw === null || raw === '') return defaults[key];
    const parsed = field(key).safeParse(raw);
    return parsed.success ? parsed.data : defaults[key];
  };

  const toParams = (view: V) => {
    const params = new URLSearchParams();
    for (const key of keys) {
      const value = key === 'q' ? view.q.trim() : view[key];
      if (value !== undefined && value !== defaults[key]) params.set(key, String(value));
    }
    return params;
  };

  return {
    defaults,
    fromParams: (params) => Object.fromEntries(keys.map((key) => [key, parsedOrDefault(key, params.get(key))])) as V,
    toParams,
    href: (pathname, view) => {
      const query = toParams(view).toString();
      return query ? `${pathname}?${query}` : pathname;
    },
  };
}
