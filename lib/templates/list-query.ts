import { z } from 'zod';
import { TEMPLATE_FIELD_LIST, type TemplateFieldName } from './template-fields';

/** Columns the list can sort by (API names): the sortable fields of the table, then the version and the dates. */
const sortKeys: TemplateSortKey[] = [
  ...TEMPLATE_FIELD_LIST.filter((field) => field.list.sort).map((field) => field.key as TemplateFieldName),
  'version',
  'createdAt',
  'updatedAt',
];
export const TEMPLATE_SORT_KEYS = sortKeys as [TemplateSortKey, ...TemplateSortKey[]];
export type TemplateSortKey = TemplateFieldName | 'version' | 'createdAt' | 'updatedAt';

/** The fields the search box matches (their SQL columns are searched with LIKE). */
export const TEMPLATE_SEARCH_FIELDS = TEMPLATE_FIELD_LIST.filter((field) => field.list.search);

export const MAX_PAGE_SIZE = 100;

/** `?q=&sort=&dir=&archived=&page=&pageSize=` of GET …/templates (page counts from 1). */
export const templateListQuerySchema = z.object({
  q: z.string().trim().max(100, 'Search (q) must be at most 100 characters').default(''),
  sort: z.enum(TEMPLATE_SORT_KEYS, { error: `Sort (sort) must be one of: ${TEMPLATE_SORT_KEYS.join(', ')}` }).default('name'),
  dir: z.enum(['asc', 'desc'], { error: 'Direction (dir) must be one of: asc, desc' }).default('asc'),
  archived: z
    .enum(['false', 'true', 'all'], { error: 'Archived filter (archived) must be one of: false, true, all' })
    .default('false'),
  page: z.coerce
    .number({ error: 'Page (page) must be a whole number from 1' })
    .int('Page (page) must be a whole number from 1')
    .min(1, 'Page (page) must be a whole number from 1')
    .default(1),
  pageSize: z.coerce
    .number({ error: `Page size (pageSize) must be a whole number, 1–${MAX_PAGE_SIZE}` })
    .int(`Page size (pageSize) must be a whole number, 1–${MAX_PAGE_SIZE}`)
    .min(1, `Page size (pageSize) must be at least 1 (allowed 1–${MAX_PAGE_SIZE})`)
    .max(MAX_PAGE_SIZE, `Page size (pageSize) must be at most ${MAX_PAGE_SIZE} (allowed 1–${MAX_PAGE_SIZE})`)
    .default(25),
});
export type TemplateListQuery = z.output<typeof templateListQuerySchema>;

/** Reads the list query from URL search parameters (empty values count as absent). */
export function listQueryFromParams(params: URLSearchParams) {
  const raw: Record<string, string> = {};
  for (const key of ['q', 'sort', 'dir', 'archived', 'page', 'pageSize']) {
    const value = params.get(key);
    if (value !== null && value !== '') raw[key] = value;
  }
  return templateListQuerySchema.safeParse(raw);
}
