'use client';

import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import Link from 'next/link';
import { usePathname, useRouter, useSearchParams } from 'next/navigation';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import useSWR from 'swr';
import type { TemplateSortKey } from '@/lib/templates/list-query';
import { TEMPLATE_FIELD_LIST } from '@/lib/templates/template-fields';
import { listViewFromParams, listViewHref, type TemplateListView } from '@/lib/templates/list-view';
import type { Template, TemplatePage } from '@/lib/templates/template';
import { inputClass } from '@/components/generator/fields';
import { formatDate, type DateFormat } from '@/lib/format/date-format';
import { formatFieldValue } from './field-labels';

const features = tableFeatures({});
const helper = createColumnHelper<typeof features, Template>();
const EMPTY: Template[] = [];

type SortableColumn = { key: TemplateSortKey; header: string };

/** The fields the field table shows as list columns, headed by their short header or label. */
const LIST_COLUMNS: SortableColumn[] = TEMPLATE_FIELD_LIST.filter((field) => field.list.column).map((field) => ({
  key: field.key as TemplateSortKey,
  header: field.list.header ?? field.label,
}));

const fetchJson = async (url: string): Promise<TemplatePage> => {
  const res = await fetch(url);
  if (!res.ok) throw new Error(((await res.json().catch(() => ({}))) as { error?: string }).error ?? `HTTP ${res.status}`);
  return res.json();
};

const SEARCH_DELAY_MS = 250;

/**
 * The list's view lives in the URL (`?q=&sort=&dir=&archived=&page=`), so a
 * reload, the back button and a shared link show the same rows. The search box
 * has its own state so typing stays instant; it reaches the URL after a pause.
 */
function useListView() {
  const searchParams = useSearchParams();
  const pathname = usePathname();
  const { replace } = useRouter();
  const view = useMemo(() => listViewFromParams(new URLSearchParams(searchParams.toString())), [searchParams]);
  const show = useCallback(
    (patch: Partial<TemplateListView>) => replace(listViewHref(pathname, { ...view, ...patch }), { scroll: false }),
    [view, pathname, replace],
  );
  return { view, show };
}

/** The search box text: follows the URL (back button, links) but never overwrites what is being typed. */
function useSearchText(urlQ: string, show: (patch: Partial<TemplateListView>) => void) {
  const [text, setText] = useState(urlQ);
  const sent = useRef(urlQ);
  const input = useRef<HTMLInputElement>(null);

  // Text typed into the server-rendered box before hydration is in the DOM but not in state: adopt it.
  useEffect(() => {
    const typed = input.current?.value;
    if (typed !== undefined && typed !== urlQ) setText(typed);
  }, []); // eslint-disable-line react-hooks/exhaustive-deps -- once, on mount: urlQ is the server-rendered value

  useEffect(() => {
    if (urlQ.trim() === sent.current.trim()) return;
    sent.current = urlQ;
    setText(urlQ);
  }, [urlQ]);

  useEffect(() => {
    if (text.trim() === sent.current.trim()) return;
    const timer = setTimeout(() => {
      sent.current = text;
      show({ q: text, page: 1 });
    }, SEARCH_DELAY_MS);
    return () => clearTimeout(timer);
  }, [text, show]);

  return { text, setText, input };
}

/** The template list: SWR fetches each page from the JSON API (search, sort, filter and paging in SQL). */
/** `dateFormat` comes from the page (the reader's locale and the deployment's time zone), so dates read as on the server. */
export function TemplateList({ slug, dateFormat }: { slug: string; dateFormat: DateFormat }) {
  const { view, show } = useListView();
  const { q: search, sort, dir, archived, page } = view;
  const { text: q, setText: setQ, input: searchInput } = useSearchText(search, show);
  const pageSize = 25;

  const params = new URLSearchParams({ q: search, sort, dir, archived, page: String(page), pageSize: String(pageSize) });
  const { data, error, isLoading } = useSWR(`/api/v1/workspaces/${slug}/templates?${params}`, fetchJson, {
    keepPreviousData: true,
  });

  const columns = useMemo(() => {
    const sortable: SortableColumn[] = [...LIST_COLUMNS, { key: 'updatedAt', header: 'Updated' }];
    return helper.columns(
      sortable.map((c) =>
        helper.accessor(c.key as keyof Template & string, {
          id: c.key,
          header: c.header,
          cell: (info) => {
            const row = info.row.original;
            if (c.key === 'name')
              return (
                <Link href={`/w/${slug}/templates/${row.id}`} className="font-medium text-gauge-700 underline dark:text-gauge-300">
                  {row.name}
                </Link>
              );
            if (c.key === 'updatedAt') return <time dateTime={row.updatedAt}>{formatDate(row.updatedAt, dateFormat)}</time>;
            if (c.key === 'rotation') return <abbr title={formatFieldValue('rotation', row.rotation)}>{row.rotation.toUpperCase()}</abbr>;
            if (c.key === 'description')
              return (
                <span className="block max-w-72 truncate font-sans" title={row.description}>
                  {row.description}
                </span>
              );
            return formatFieldValue(c.key, info.getValue());
          },
        }),
      ),
    );
  }, [slug, dateFormat]);

  const table = useTable({ features, columns, data: data?.items ?? EMPTY });
  const total = data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / pageSize));

  const toggleSort = (key: TemplateSortKey) =>
    show(sort === key ? { dir: dir === 'asc' ? 'desc' : 'asc', page: 1 } : { sort: key, dir: 'asc', page: 1 });

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="space-y-1">
          <label htmlFor="template-search" className="block text-sm font-medium">
            Search name and engine
          </label>
          <input ref={searchInput} id="template-search" type="search" value={q} onChange={(e) => setQ(e.target.value)} className={`${inputClass} w-72`} />
        </div>
        <div className="space-y-1">
          <label htmlFor="template-archived" className="block text-sm font-medium">
            Show
          </label>
          <select id="template-archived" value={archived} onChange={(e) => show({ archived: e.target.value as typeof archived, page: 1 })} className={inputClass}>
            <option value="false">In use</option>
            <option value="true">Archived only</option>
            <option value="all">All</option>
          </select>
        </div>
        <p role="status" aria-live="polite" className="text-sm text-steel-600 dark:text-steel-300">
          {error ? `Could not load templates: ${error.message}` : isLoading ? 'Loading…' : `${total} template${total === 1 ? '' : 's'}`}
        </p>
      </div>
      <div className="overflow-x-auto rounded-lg border border-steel-200 dark:border-steel-800">
        <table className="min-w-full text-sm">
          <thead className="bg-steel-50 text-left dark:bg-steel-900">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const key = header.column.id as TemplateSortKey;
                  const active = sort === key;
                  return (
                    <th key={header.id} scope="col" aria-sort={active ? (dir === 'asc' ? 'ascending' : 'descending') : 'none'} className="whitespace-nowrap px-3 py-2 font-semibold">
                      <button type="button" onClick={() => toggleSort(key)} className="inline-flex items-center gap-1 hover:underline">
                        <table.FlexRender header={header} />
                        <span aria-hidden="true" className="text-xs text-steel-400">
                          {active ? (dir === 'asc' ? '▲' : '▼') : '↕'}
                        </span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-steel-100 dark:border-steel-800">
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className="whitespace-nowrap px-3 py-2 font-mono text-xs tabular-nums first:font-sans first:text-sm">
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <nav aria-label="Template pages" className="flex items-center gap-3 text-sm">
        <button type="button" disabled={page <= 1} onClick={() => show({ page: page - 1 })} className="rounded border border-steel-300 px-3 py-1 disabled:opacity-50">
          Previous
        </button>
        <span>
          Page {page} of {pages}
        </span>
        <button type="button" disabled={page >= pages} onClick={() => show({ page: page + 1 })} className="rounded border border-steel-300 px-3 py-1 disabled:opacity-50">
          Next
        </button>
      </nav>
    </div>
  );
}
