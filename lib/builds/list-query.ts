import { z } from 'zod';
import { BUILD_FIELD_LIST, BUILD_STATUSES } from './build-fields';

/** Columns the list can sort by: the field table's sortable fields and the time of the last change. */
export const BUILD_SORT_KEYS = ['updatedAt', ...BUILD_FIELD_LIST.filter((f) => f.list.sort).map((f) => f.key as string)] as [string, ...string[]];

export const MAX_BUILD_PAGE_SIZE = 100;

const idFilter = (label: string, key: string) =>
  z.coerce
    .number({ error: `${label} (${key}) must be an id, a whole number from 1` })
    .int(`${label} (${key}) must be an id, a whole number from 1`)
    .min(1, `${label} (${key}) must be an id, a whole number from 1`)
    .optional();

/** `?q=&status=&technician=&template=&sort=&dir=&page=&pageSize=` of GET …/builds and of the list page's URL. */
export const buildListQuerySchema = z.object({
  q: z.string().trim().max(100, 'Search (q) must be at most 100 characters').default(''),
  status: z.enum([...BUILD_STATUSES, 'all'], { error: `Status (status) must be one of: ${[...BUILD_STATUSES, 'all'].join(', ')}` }).default('all'),
  technician: idFilter('Technician', 'technician'),
  template: idFilter('Template', 'template'),
  sort: z.enum(BUILD_SORT_KEYS, { error: `Sort (sort) must be one of: ${BUILD_SORT_KEYS.join(', ')}` }).default('updatedAt'),
  dir: z.enum(['asc', 'desc'], { error: 'Direction (dir) must be one of: asc, desc' }).default('desc'),
  page: z.coerce.number({ error: 'Page (page) must be a whole number from 1' }).int('Page (page) must be a whole number from 1').min(1, 'Page (page) must be a whole number from 1').default(1),
  pageSize: z.coerce
    .number({ error: `Page size (pageSize) must be a whole number, 1–${MAX_BUILD_PAGE_SIZE}` })
    .int(`Page size (pageSize) must be a whole number, 1–${MAX_BUILD_PAGE_SIZE}`)
    .min(1, `Page size (pageSize) must be at least 1 (allowed 1–${MAX_BUILD_PAGE_SIZE})`)
    .max(MAX_BUILD_PAGE_SIZE, `Page size (pageSize) must be at most ${MAX_BUILD_PAGE_SIZE} (allowed 1–${MAX_BUILD_PAGE_SIZE})`)
    .default(25),
});
export type BuildListQuery = z.output<typeof buildListQuerySchema>;
export const BUILD_LIST_PARAMS = Object.keys(buildListQuerySchema.shape) as Array<keyof BuildListQuery>;

/** Reads the list query from URL search parameters (empty values count as absent). */
export function buildListQueryFromParams(params: URLSearchParams) {
  const raw: Record<string, string> = {};
  for (const key of BUILD_LIST_PARAMS) {
    const value = params.get(key);
    if (value !== null && value !== '') raw[key] = value;
  }
  return buildListQuerySchema.safeParse(raw);
}
