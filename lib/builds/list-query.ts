import { z } from 'zod';
import { choiceField, queryNumberField } from '@/lib/fields/builders';
import { defineFields, shapeOf } from '@/lib/fields/field';
import { pagedListFields } from '@/lib/fields/list-query-fields';
import { BUILD_FIELD_LIST, BUILD_STATUSES } from './build-fields';

/** Columns the list can sort by: the field table's sortable fields and the time of the last change. */
export const BUILD_SORT_KEYS = ['updatedAt', ...BUILD_FIELD_LIST.filter((f) => f.list.sort).map((f) => f.key as string)] as [string, ...string[]];

export const MAX_BUILD_PAGE_SIZE = 100;

/** `?q=&status=&technician=&template=&sort=&dir=&page=&pageSize=` of GET …/builds and of the list page's URL. */
const buildListQueryFields = defineFields({
  ...pagedListFields({ dir: 'desc', maxPageSize: MAX_BUILD_PAGE_SIZE, pageSize: 25 }),
  status: choiceField({ label: 'Status', choices: [...BUILD_STATUSES, 'all'] }).default('all'),
  technician: queryNumberField({ label: 'Technician', min: 1 }).optional(),
  template: queryNumberField({ label: 'Template', min: 1 }).optional(),
  sort: choiceField({ label: 'Sort', choices: BUILD_SORT_KEYS }).default('updatedAt'),
});
export const buildListQuerySchema = z.object(shapeOf(buildListQueryFields));
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
