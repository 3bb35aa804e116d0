import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { shapeOf, defineFields } from '@/lib/fields/field';
import { pagedListFields } from '@/lib/fields/list-query-fields';

const schema = z.object(shapeOf(defineFields(pagedListFields({ dir: 'asc', maxPageSize: 50, pageSize: 20 }))));

describe('pagedListFields', () => {
  it('reads the query string text and fills the defaults', () => {
    expect(schema.parse({ page: '3' })).toEqual({ q: '', dir: 'asc', page: 3, pageSize: 20 });
  });

  it('names each parameter by its label with the allowed values, never by its key', () => {
    const issues = schema.safeParse({ q: 'x'.repeat(101), dir: 'up', page: '0', pageSize: '51' }).error?.issues ?? [];
    expect(issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['q', 'Search must be at most 100 characters'],
      ['dir', 'Sort direction must be one of: asc, desc'],
      ['page', 'Page must be at least 1 (allowed 1 or more)'],
      ['pageSize', 'Page size must be at most 50 (allowed 1–50)'],
    ]);
  });
});
