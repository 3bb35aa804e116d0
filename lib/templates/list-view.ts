import { templateListQuerySchema, type TemplateListQuery } from './list-query';

/** What the template list page keeps in its URL: `?q=&sort=&dir=&archived=&page=`. */
export type TemplateListView = Pick<TemplateListQuery, 'q' | 'sort' | 'dir' | 'archived' | 'page'>;

const VIEW_KEYS = ['q', 'sort', 'dir', 'archived', 'page'] as const;
const fields = templateListQuerySchema.shape;

/** The view with no parameters: the API's defaults, from the same schema. */
export const DEFAULT_LIST_VIEW: TemplateListView = {
  q: fields.q.parse(undefined),
  sort: fields.sort.parse(undefined),
  dir: fields.dir.parse(undefined),
  archived: fields.archived.parse(undefined),
  page: fields.page.parse(undefined),
};

function parsedOrDefault<K extends (typeof VIEW_KEYS)[number]>(key: K, raw: string | null): TemplateListView[K] {
  if (raw === null || raw === '') return DEFAULT_LIST_VIEW[key];
  const parsed = fields[key].safeParse(raw);
  return parsed.success ? (parsed.data as TemplateListView[K]) : DEFAULT_LIST_VIEW[key];
}

/**
 * Reads the view from the page URL with the API's list-query schema, one
 * parameter at a time: a link with one bad value (`?sort=colour`) keeps the
 * others and shows the default for that one instead of an error.
 */
export function listViewFromParams(params: URLSearchParams): TemplateListView {
  return {
    q: parsedOrDefault('q', params.get('q')),
    sort: parsedOrDefault('sort', params.get('sort')),
    dir: parsedOrDefault('dir', params.get('dir')),
    archived: parsedOrDefault('archived', params.get('archived')),
    page: parsedOrDefault('page', params.get('page')),
  };
}

/** The URL parameters of a view: defaults left out (the plain list keeps a plain URL), always in the same order. */
export function listViewToParams(view: TemplateListView): URLSearchParams {
  const params = new URLSearchParams();
  for (const key of VIEW_KEYS) {
    const value = key === 'q' ? view.q.trim() : view[key];
    if (value !== DEFAULT_LIST_VIEW[key]) params.set(key, String(value));
  }
  return params;
}

/** The page's own URL for a view (`/w/x/templates` for the default view). */
export function listViewHref(pathname: string, view: TemplateListView): string {
  const query = listViewToParams(view).toString();
  return query ? `${pathname}?${query}` : pathname;
}
