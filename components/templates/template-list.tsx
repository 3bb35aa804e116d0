'use client';

import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import useSWR from 'swr';
import type { TemplateSortKey } from '@/lib/templates/list-query';
import { TEMPLATE_FIELD_LIST } from '@/lib/templates/template-fields';
import { listViewFromParams, listViewHref, type TemplateListView } from '@/lib/templates/list-view';
import type { Template, TemplatePage } from '@/lib/templates/template';
import { ListFilter, ListSearch, ListToolbar } from '@/components/lists/list-controls';
import { ListPager } from '@/components/lists/list-pager';
import { RecordLink } from '@/components/lists/record-link';
import { listFeatures, SortableTable } from '@/components/lists/sortable-table';
import { fetchListPage, useListView, useSearchText } from '@/components/lists/use-list-view';
import { formatDate, type DateFormat } from '@/lib/format/date-format';
import { countOf } from '@/lib/format/number-format';
import { formatFieldValue } from './field-labels';

const helper = createColumnHelper<typeof listFeatures, Template>();
const EMPTY: Template[] = [];

type SortableColumn = { key: TemplateSortKey; header: string };

/** The fields the field table shows as list columns, headed by their short header or label. */
const LIST_COLUMNS: SortableColumn[] = TEMPLATE_FIELD_LIST.filter((field) => field.list.column).map((field) => ({
  key: field.key as TemplateSortKey,
  header: field.list.header ?? field.label,
}));
const COLUMNS: SortableColumn[] = [...LIST_COLUMNS, { key: 'updatedAt', header: 'Updated' }];
const SORTABLE: ReadonlySet<string> = new Set(COLUMNS.map((c) => c.key));

/** The template list: SWR fetches each page from the JSON API (search, sort, filter and paging in SQL). */
/** `dateFormat` comes from the page (the reader's locale and the deployment's time zone), so dates read as on the server. */
export function TemplateList({ slug, dateFormat }: { slug: string; dateFormat: DateFormat }) {
  const { view, show } = useListView<TemplateListView>(listViewFromParams, listViewHref);
  const { q: search, sort, dir, archived, page } = view;
  const { text: q, setText: setQ, input: searchInput } = useSearchText(search, show);
  const pageSize = 25;

  const params = new URLSearchParams({ q: search, sort, dir, archived, page: String(page), pageSize: String(pageSize) });
  const { data, error, isLoading } = useSWR(`/api/v1/workspaces/${slug}/templates?${params}`, fetchListPage<TemplatePage>, { keepPreviousData: true });

  const columns = useMemo(() => {
    return helper.columns(
      COLUMNS.map((c) =>
        helper.accessor(c.key as keyof Template & string, {
          id: c.key,
          header: c.header,
          cell: (info) => {
            const row = info.row.original;
            if (c.key === 'name') return <RecordLink href={`/w/${slug}/templates/${row.id}`}>{row.name}</RecordLink>;
            if (c.key === 'updatedAt') return <time dateTime={row.updatedAt}>{formatDate(row.updatedAt, dateFormat)}</time>;
            if (c.key === 'rotation') return <abbr title={formatFieldValue('rotation', row.rotation, dateFormat.locale)}>{row.rotation.toUpperCase()}</abbr>;
            if (c.key === 'description')
              return (
                <span className="block max-w-40 truncate font-sans xl:max-w-56" title={row.description}>
                  {row.description}
                </span>
              );
            return formatFieldValue(c.key, info.getValue(), dateFormat.locale);
          },
        }),
      ),
    );
  }, [slug, dateFormat]);

  const total = data?.total ?? 0;

  return (
    <div className="space-y-3">
      <ListToolbar
        status={error ? `Could not load templates: ${error.message}` : isLoading ? 'Loading…' : countOf(total, 'template', dateFormat.locale)}
      >
        <ListSearch id="template-search" label="Search name and engine" text={q} onText={setQ} input={searchInput} />
        <ListFilter
          id="template-archived"
          label="Show"
          value={archived}
          options={[
            { value: 'false', label: 'In use' },
            { value: 'true', label: 'Archived only' },
            { value: 'all', label: 'All' },
          ]}
          onChoose={(choice) => show({ archived: choice as typeof archived, page: 1 })}
        />
      </ListToolbar>
      <SortableTable
        label="Templates"
        columns={columns}
        rows={data?.items ?? EMPTY}
        sortable={SORTABLE}
        view={view}
        onSort={(next) => show({ ...next, sort: next.sort as TemplateSortKey })}
        cellClassName="font-mono text-xs tabular-nums first:font-sans first:text-sm"
      />
      <ListPager locale={dateFormat.locale} label="Template pages" page={page} total={total} pageSize={pageSize} onPage={(next) => show({ page: next })} />
    </div>
  );
}
