import { describe, expect, it } from 'vitest';
import { buildListViewFromParams, buildListViewHref, buildListViewToParams, type BuildListView } from '@/lib/builds/list-view';

// The codec of lib/lists/list-view.ts, driven through the build list's view (the template list's is in
// tests/lib/templates/list-view.test.ts): the API's own defaults, one bad parameter falls back alone.
const fromQuery = (query: string) => buildListViewFromParams(new URLSearchParams(query));
const DEFAULT: BuildListView = { q: '', status: 'all', technician: undefined, template: undefined, sort: 'updatedAt', dir: 'desc', page: 1 };

describe('listViewCodec (build records)', () => {
  it('reads a plain URL as the API’s defaults, with no technician or template filter', () => {
    expect(fromQuery('')).toEqual(DEFAULT);
  });

  it('keeps the good parameters and drops a bad one to its default', () => {
    expect(fromQuery('status=lost&technician=4&page=0')).toEqual({ ...DEFAULT, technician: 4 });
    expect(fromQuery('template=x&sort=customerName&dir=asc')).toEqual({ ...DEFAULT, sort: 'customerName', dir: 'asc' });
  });

  it('writes only what differs from the defaults, in a fixed order, and reads it back the same', () => {
    const view: BuildListView = { ...DEFAULT, q: ' harbour ', status: 'done', template: 12, page: 3 };
    expect(buildListViewToParams(view).toString()).toBe('q=harbour&status=done&template=12&page=3');
    expect(buildListViewHref('/w/shop/builds', { ...DEFAULT })).toBe('/w/shop/builds');
    expect(fromQuery(buildListViewToParams(view).toString())).toEqual({ ...view, q: 'harbour' });
  });
});
