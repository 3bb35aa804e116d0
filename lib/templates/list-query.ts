import { z } from 'zod';
import { choiceField } from '@/lib/fields/builders';
import { defineFields, shapeOf } from '@/lib/fields/field';
import { pagedListFields } from '@/lib/fields/list-query-fields';
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
const templateListQueryFields = defineFields({
  ...pagedListFields({ dir: 'asc', maxPageSize: MAX_PAGE_SIZE, pageSize: 25 }),
  sort: choiceField({ label: 'Sort', choices: TEMPLATE_SORT_KEYS }).default('name'),
  archived: choiceField({ label: 'Archived filter', choices: ['false', 'true', 'all'] }).default('false'),
});
export const templateListQuerySchema = z.object(shapeOf(templateListQueryFields));
export type TemplateListQuery = z.output<typeof templateListQuerySchema>;

/** Reads the list query from URL search parameters (empty values count as absent). */
export function listQueryFromParams(params: URLSearchParams) {
  const raw: Record<string, string> = {};
  for (const key of Object.keys(templateListQueryFields)) {
    const value = params.get(key);
    if (value !== null && value !== '') raw[key] = value;
  }
  return templateListQuerySchema.safeParse(raw);
}
