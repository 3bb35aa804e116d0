import { choiceField, queryNumberField, textField } from './builders';

export const SORT_DIRECTIONS = ['asc', 'desc'] as const;

/**
 * The query parameters every paged list takes (`?q=&dir=&page=&pageSize=`), declared
 * like any other field so their messages name them by label: "Page size must be at
 * most 100 (allowed 1–100)"; the API error's `path` still says which parameter.
 */
export function pagedListFields(options: { dir: (typeof SORT_DIRECTIONS)[number]; maxPageSize: number; pageSize: number }) {
  return {
    q: textField({ label: 'Search', maxLength: 100 }).default(''),
    dir: choiceField({ label: 'Sort direction', choices: SORT_DIRECTIONS }).default(options.dir),
    page: queryNumberField({ label: 'Page', min: 1 }).default(1),
    pageSize: queryNumberField({ label: 'Page size', min: 1, max: options.maxPageSize }).default(options.pageSize),
  };
}
