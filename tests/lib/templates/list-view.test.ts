import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { TEMPLATE_SORT_KEYS, listQueryFromParams } from '@/lib/templates/list-query';
import { DEFAULT_LIST_VIEW, listViewFromParams, listViewHref, listViewToParams, type TemplateListView } from '@/lib/templates/list-view';

const fromQuery = (query: string) => listViewFromParams(new URLSearchParams(query));

describe('DEFAULT_LIST_VIEW', () => {
  it('is what the API uses when the query is empty', () => {
    const api = listQueryFromParams(new URLSearchParams());
    expect(api.success).toBe(true);
    const { q, sort, dir, archived, page } = api.data!;
    expect(DEFAULT_LIST_VIEW).toEqual({ q, sort, dir, archived, page });
    expect(DEFAULT_LIST_VIEW).toEqual({ q: '', sort: 'name', dir: 'asc', archived: 'false', page: 1 });
  });
});

describe('listViewFromParams', () => {
  it('reads every parameter of a shared link', () => {
    expect(fromQuery('q=scooter&sort=boreMm&dir=desc&archived=true&page=3')).toEqual({
      q: 'scooter',
      sort: 'boreMm',
      dir: 'desc',
      archived: 'true',
      page: 3,
    });
  });

  it('falls back to the default for each bad value and keeps the good ones', () => {
    expect(fromQuery('q=kart&sort=colour&dir=up&archived=maybe&page=-2')).toEqual({ ...DEFAULT_LIST_VIEW, q: 'kart' });
    expect(fromQuery('page=2.5&sort=strokeMm')).toEqual({ ...DEFAULT_LIST_VIEW, sort: 'strokeMm' });
    expect(fromQuery('page=abc')).toEqual(DEFAULT_LIST_VIEW);
    expect(fromQuery(`q=${'x'.repeat(101)}&archived=all`)).toEqual({ ...DEFAULT_LIST_VIEW, archived: 'all' });
  });

  it('treats empty values as absent and trims the search like the API', () => {
    expect(fromQuery('q=&sort=&dir=&archived=&page=')).toEqual(DEFAULT_LIST_VIEW);
    expect(fromQuery('q=%20%20scooter%20').q).toBe('scooter');
  });

  it('ignores parameters that are not part of the view', () => {
    expect(fromQuery('pageSize=5&colour=red')).toEqual(DEFAULT_LIST_VIEW);
  });
});

describe('listViewToParams', () => {
  it('leaves the defaults out, so the plain list has a plain URL', () => {
    expect(listViewToParams(DEFAULT_LIST_VIEW).toString()).toBe('');
    expect(listViewHref('/w/shop/templates', DEFAULT_LIST_VIEW)).toBe('/w/shop/templates');
    expect(listViewHref('/w/shop/templates', { ...DEFAULT_LIST_VIEW, q: '  ' })).toBe('/w/shop/templates');
  });

  it('writes the changed values in a fixed order, URL-encoded', () => {
    // WHATWG URL Standard, application/x-www-form-urlencoded serializer: space → "+", "&" → "%26".
    const view: TemplateListView = { q: '125 cc & up', sort: 'updatedAt', dir: 'desc', archived: 'all', page: 2 };
    expect(listViewHref('/w/shop/templates', view)).toBe('/w/shop/templates?q=125+cc+%26+up&sort=updatedAt&dir=desc&archived=all&page=2');
  });

  it('round-trips every valid view through the URL (property test)', () => {
    const view = fc.record({
      q: fc.string({ maxLength: 100 }).map((text) => text.trim()),
      sort: fc.constantFrom(...TEMPLATE_SORT_KEYS),
      dir: fc.constantFrom('asc' as const, 'desc' as const),
      archived: fc.constantFrom('false' as const, 'true' as const, 'all' as const),
      page: fc.integer({ min: 1, max: 10_000 }),
    });
    fc.assert(
      fc.property(view, (v) => {
        expect(listViewFromParams(listViewToParams(v))).toEqual(v);
      }),
    );
  });

  it('writes only values the API accepts', () => {
    const params = listViewToParams({ q: 'reed', sort: 'rimDiameterMm', dir: 'desc', archived: 'true', page: 4 });
    expect(listQueryFromParams(params).success).toBe(true);
  });
});
