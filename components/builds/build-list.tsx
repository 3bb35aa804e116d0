'use client';

import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import useSWR from 'swr';
import { ListFilter, ListSearch, ListToolbar } from '@/components/lists/list-controls';
import { ListPager } from '@/components/lists/list-pager';
import { RecordLink } from '@/components/lists/record-link';
import { listFeatures, SortableTable } from '@/components/lists/sortable-table';
import { fetchListPage, useListView, useSearchText } from '@/components/lists/use-list-view';
import type { Build, BuildPage } from '@/lib/builds/build';
import { BUILD_FIELD_LIST, BUILD_STATUSES } from '@/lib/builds/build-fields';
import { buildListViewFromParams, buildListViewHref, buildListViewToParams, type BuildListView } from '@/lib/builds/list-view';
import { StatusBadge } from './status-badge';
import { formatDate, type DateFormat } from '@/lib/format/date-format';
import { countOf } from '@/lib/format/number-format';

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
              if (c.key === 'customerName') return <RecordLink href={`/w/${slug}/builds/${row.id}`}>{row.customerName}</RecordLink>;
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

  return (
    <div className="space-y-3">
      <ListToolbar
        status={error ? `Could not load build records: ${error.message}` : isLoading ? 'Loading…' : countOf(total, 'record', dateFormat.locale)}
      >
        <ListSearch id="build-search" label="Search customer, engine number, engine" text={text} onText={setText} input={input} />
        <ListFilter
          id="build-status"
          label="Status"
          value={view.status}
          options={[{ value: 'all', label: 'All' }, ...BUILD_STATUSES.map((s) => ({ value: s, label: s }))]}
          onChoose={(status) => show({ status: status as BuildListView['status'], page: 1 })}
        />
        <ListFilter
          id="build-technician"
          label="Technician"
          value={String(view.technician ?? '')}
          options={[{ value: '', label: 'Anyone' }, ...technicians.map((t) => ({ value: String(t.id), label: t.name }))]}
          onChoose={(id) => show({ technician: idOrUndefined(id), page: 1 })}
        />
        <ListFilter
          id="build-template"
          label="Template"
          value={String(view.template ?? '')}
          options={[{ value: '', label: 'Any' }, ...templates.map((t) => ({ value: String(t.id), label: t.name }))]}
          onChoose={(id) => show({ template: idOrUndefined(id), page: 1 })}
        />
      </ListToolbar>
      <SortableTable label="Build records" columns={columns} rows={data?.items ?? EMPTY} sortable={sortable} view={view} onSort={show} />
      <ListPager locale={dateFormat.locale} label="Build record pages" page={view.page} total={total} pageSize={PAGE_SIZE} onPage={(page) => show({ page })} />
    </div>
  );
}
