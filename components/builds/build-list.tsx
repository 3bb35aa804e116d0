'use client';

import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import Link from 'next/link';
import { usePathname, useRouter, useSearchParams } from 'next/navigation';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import useSWR from 'swr';
import { inputClass } from '@/components/generator/fields';
import type { Build, BuildPage } from '@/lib/builds/build';
import { BUILD_FIELD_LIST, BUILD_STATUSES } from '@/lib/builds/build-fields';
import { buildListViewFromParams, buildListViewHref, buildListViewToParams, type BuildListView } from '@/lib/builds/list-view';
import { StatusBadge } from './status-badge';
import { formatDate, type DateFormat } from '@/lib/format/date-format';

const features = tableFeatures({});
const helper = createColumnHelper<typeof features, Build>();
const EMPTY: Build[] = [];
const PAGE_SIZE = 25;
const SEARCH_DELAY_MS = 250;

type Option = { id: number; name: string };

/** The list's columns: the field table's list columns, then who, from what, and when. */
const FIELD_COLUMNS = BUILD_FIELD_LIST.filter((f) => f.list.column).map((f) => ({ key: f.key, header: f.label, sortable: Boolean(f.list.sort) }));

const fetchJson = async (url: string): Promise<BuildPage> => {
  const res = await fetch(url);
  if (!res.ok) throw new Error(((await res.json().catch(() => ({}))) as { error?: string }).error ?? `HTTP ${res.status}`);
  return res.json();
};

function useListView() {
  const searchParams = useSearchParams();
  const pathname = usePathname();
  const { replace } = useRouter();
  const view = useMemo(() => buildListViewFromParams(new URLSearchParams(searchParams.toString())), [searchParams]);
  const show = useCallback(
    (patch: Partial<BuildListView>) => replace(buildListViewHref(pathname, { ...view, ...patch }), { scroll: false }),
    [view, pathname, replace],
  );
  return { view, show };
}

/** The search box: instant typing, reaching the URL after a pause; follows the URL on back/forward. */
function useSearchText(urlQ: string, show: (patch: Partial<BuildListView>) => void) {
  const [text, setText] = useState(urlQ);
  const sent = useRef(urlQ);
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
  return { text, setText };
}

function idOrUndefined(value: string): number | undefined {
  return value === '' ? undefined : Number(value);
}

/** The build records of a workspace: SWR reads each page from the JSON API (search, filters, sort and paging in SQL). */
/** `dateFormat` comes from the page (the reader's locale and the deployment's time zone), so dates read as on the server. */
export function BuildList({ slug, technicians, templates, dateFormat }: { slug: string; technicians: Option[]; templates: Option[]; dateFormat: DateFormat }) {
  const { view, show } = useListView();
  const { text, setText } = useSearchText(view.q, show);
  const params = buildListViewToParams(view);
  params.set('pageSize', String(PAGE_SIZE));
  const { data, error, isLoading } = useSWR(`/api/v1/workspaces/${slug}/builds?${params}`, fetchJson, { keepPreviousData: true });

  const columns = useMemo(
    () =>
      helper.columns([
        ...FIELD_COLUMNS.map((c) =>
          helper.accessor((row) => (c.key === 'openedOn' ? formatDate(row.openedOn, dateFormat) : String(row[c.key as keyof Build] ?? '')), {
            id: c.key,
            header: c.header,
            cell: (info) => {
              const row = info.row.original;
              if (c.key === 'customerName')
                return (
                  <Link href={`/w/${slug}/builds/${row.id}`} className="font-medium text-gauge-700 underline dark:text-gauge-300">
                    {row.customerName}
                  </Link>
                );
              if (c.key === 'status') return <StatusBadge status={row.status} />;
              return info.getValue();
            },
          }),
        ),
        helper.accessor((row) => row.technician?.name ?? '', { id: 'technician', header: 'Technician' }),
        helper.accessor((row) => row.template?.name ?? '', { id: 'template', header: 'Template' }),
        helper.accessor((row) => formatDate(row.updatedAt, dateFormat), { id: 'updatedAt', header: 'Updated' }),
      ]),
    [slug, dateFormat],
  );
  const sortable = new Set([...FIELD_COLUMNS.filter((c) => c.sortable).map((c) => c.key), 'updatedAt']);

  const table = useTable({ features, columns, data: data?.items ?? EMPTY });
  const total = data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));
  const toggleSort = (key: string) =>
    show(view.sort === key ? { dir: view.dir === 'asc' ? 'desc' : 'asc', page: 1 } : { sort: key, dir: 'asc', page: 1 });

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="space-y-1">
          <label htmlFor="build-search" className="block text-sm font-medium">
            Search customer, engine number, engine
          </label>
          <input id="build-search" type="search" value={text} onChange={(e) => setText(e.target.value)} className={`${inputClass} w-72`} />
        </div>
        <div className="space-y-1">
          <label htmlFor="build-status" className="block text-sm font-medium">
            Status
          </label>
          <select id="build-status" value={view.status} onChange={(e) => show({ status: e.target.value as BuildListView['status'], page: 1 })} className={inputClass}>
            <option value="all">All</option>
            {BUILD_STATUSES.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        </div>
        <div className="space-y-1">
          <label htmlFor="build-technician" className="block text-sm font-medium">
            Technician
          </label>
          <select id="build-technician" value={view.technician ?? ''} onChange={(e) => show({ technician: idOrUndefined(e.target.value), page: 1 })} className={inputClass}>
            <option value="">Anyone</option>
            {technicians.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </select>
        </div>
        <div className="space-y-1">
          <label htmlFor="build-template" className="block text-sm font-medium">
            Template
          </label>
          <select id="build-template" value={view.template ?? ''} onChange={(e) => show({ template: idOrUndefined(e.target.value), page: 1 })} className={inputClass}>
            <option value="">Any</option>
            {templates.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </select>
        </div>
        <p role="status" aria-live="polite" className="text-sm text-steel-600 dark:text-steel-300">
          {error ? `Could not load build records: ${error.message}` : isLoading ? 'Loading…' : `${total} record${total === 1 ? '' : 's'}`}
        </p>
      </div>
      <div className="overflow-x-auto rounded-lg border border-steel-200 dark:border-steel-800">
        <table className="min-w-full text-sm">
          <thead className="bg-steel-50 text-left dark:bg-steel-900">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const key = header.column.id;
                  const active = view.sort === key;
                  return (
                    <th key={header.id} scope="col" aria-sort={active ? (view.dir === 'asc' ? 'ascending' : 'descending') : 'none'} className="whitespace-nowrap px-3 py-2 font-semibold">
                      {sortable.has(key) ? (
                        <button type="button" onClick={() => toggleSort(key)} className="inline-flex items-center gap-1 hover:underline">
                          <table.FlexRender header={header} />
                          <span aria-hidden="true" className="text-xs text-steel-400">
                            {active ? (view.dir === 'asc' ? '▲' : '▼') : '↕'}
                          </span>
                        </button>
                      ) : (
                        <table.FlexRender header={header} />
                      )}
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
                  <td key={cell.id} className="whitespace-nowrap px-3 py-2">
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <nav aria-label="Build record pages" className="flex items-center gap-3 text-sm">
        <button type="button" disabled={view.page <= 1} onClick={() => show({ page: view.page - 1 })} className="rounded border border-steel-300 px-3 py-1 disabled:opacity-50">
          Previous
        </button>
        <span>
          Page {view.page} of {pages}
        </span>
        <button type="button" disabled={view.page >= pages} onClick={() => show({ page: view.page + 1 })} className="rounded border border-steel-300 px-3 py-1 disabled:opacity-50">
          Next
        </button>
      </nav>
    </div>
  );
}
