'use client';

import { createColumnHelper } from '@tanstack/react-table';
import Link from 'next/link';
import { useMemo } from 'react';
import useSWR from 'swr';
import { inputClass } from '@/components/generator/fields';
import { ListPager } from '@/components/lists/list-pager';
import { listFeatures, SortableTable } from '@/components/lists/sortable-table';
import { fetchListPage, useListView, useSearchText } from '@/components/lists/use-list-view';
import type { Build, BuildPage } from '@/lib/builds/build';
import { BUILD_FIELD_LIST, BUILD_STATUSES } from '@/lib/builds/build-fields';
import { buildListViewFromParams, buildListViewHref, buildListViewToParams, type BuildListView } from '@/lib/builds/list-view';
import { StatusBadge } from './status-badge';
import { formatDate, type DateFormat } from '@/lib/format/date-format';

const helper = createColumnHelper<typeof listFeatures, Build>();
const EMPTY: Build[] = [];
const PAGE_SIZE = 25;

type Option = { id: number; name: string };

/** The list's columns: the field table's list columns, then who, from what, and when. */
const FIELD_COLUMNS = BUILD_FIELD_LIST.filter((f) => f.list.column).map((f) => ({ key: f.key, header: f.label, sortable: Boolean(f.list.sort) }));

function idOrUndefined(value: string): number | undefined {
  return value === '' ? undefined : Number(value);
}

/** The build records of a workspace: SWR reads each page from the JSON API (search, filters, sort and paging in SQL). */
/** `dateFormat` comes from the page (the reader's locale and the deployment's time zone), so dates read as on the server. */
export function BuildList({ slug, technicians, templates, dateFormat }: { slug: string; technicians: Option[]; templates: Option[]; dateFormat: DateFormat }) {
  const { view, show } = useListView<BuildListView>(buildListViewFromParams, buildListViewHref);
  const { text, setText, input } = useSearchText(view.q, show);
  const params = buildListViewToParams(view);
  params.set('pageSize', String(PAGE_SIZE));
  const { data, error, isLoading } = useSWR(`/api/v1/workspaces/${slug}/builds?${params}`, fetchListPage<BuildPage>, { keepPreviousData: true });

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

  const total = data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="space-y-1">
          <label htmlFor="build-search" className="block text-sm font-medium">
            Search customer, engine number, engine
          </label>
          <input ref={input} id="build-search" type="search" value={text} onChange={(e) => setText(e.target.value)} className={`${inputClass} w-72 max-w-full`} />
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
      <SortableTable label="Build records" columns={columns} rows={data?.items ?? EMPTY} sortable={sortable} view={view} onSort={show} />
      <ListPager label="Build record pages" page={view.page} pages={pages} onPage={(page) => show({ page })} />
    </div>
  );
}
