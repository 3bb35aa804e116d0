import { buildListQuerySchema, type BuildListQuery } from './list-query';

/** What the build list page keeps in its URL: `?q=&status=&technician=&template=&sort=&dir=&page=`. */
export type BuildListView = Pick<BuildListQuery, 'q' | 'status' | 'technician' | 'template' | 'sort' | 'dir' | 'page'>;

const VIEW_KEYS = ['q', 'status', 'technician', 'template', 'sort', 'dir', 'page'] as const;
const fields = buildListQuerySchema.shape;

/** The view with no parameters: the API's defaults, from the same schema. */
export const DEFAULT_BUILD_LIST_VIEW: BuildListView = {
  q: fields.q.parse(undefined),
  status: fields.status.parse(undefined),
  technician: undefined,
  template: undefined,
  sort: fields.sort.parse(undefined),
  dir: fields.dir.parse(undefined),
  page: fields.page.parse(undefined),
};

function parsedOrDefault<K extends (typeof VIEW_KEYS)[number]>(key: K, raw: string | null): BuildListView[K] {
  if (raw === null || raw === '') return DEFAULT_BUILD_LIST_VIEW[key];
  const parsed = fields[key].safeParse(raw);
  return parsed.success ? (parsed.data as BuildListView[K]) : DEFAULT_BUILD_LIST_VIEW[key];
}

/** Reads the view from the page URL one parameter at a time: a bad value falls back to its default alone. */
export function buildListViewFromParams(params: URLSearchParams): BuildListView {
  const view = {} as Record<(typeof VIEW_KEYS)[number], unknown>;
  for (const key of VIEW_KEYS) view[key] = parsedOrDefault(key, params.get(key));
  return view as BuildListView;
}

/** The URL parameters of a view, defaults left out, always in the same order (also the API's query). */
export function buildListViewToParams(view: BuildListView): URLSearchParams {
  const params = new URLSearchParams();
  for (const key of VIEW_KEYS) {
    const value = key === 'q' ? view.q.trim() : view[key];
    if (value !== undefined && value !== DEFAULT_BUILD_LIST_VIEW[key]) params.set(key, String(value));
  }
  return params;
}

export function buildListViewHref(pathname: string, view: BuildListView): string {
  const query = buildListViewToParams(view).toString();
  return query ? `${pathname}?${query}` : pathname;
}
