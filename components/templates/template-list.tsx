'use client';

import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import Link from 'next/link';
import { useEffect, useMemo, useState } from 'react';
import useSWR from 'swr';
import type { TemplateSortKey } from '@/lib/templates/list-query';
import type { Template, TemplatePage } from '@/lib/templates/template';
import { inputClass } from '@/components/generator/fields';
import { formatFieldValue, formatWhen } from './field-labels';

const features = tableFeatures({});
const helper = createColumnHelper<typeof features, Template>();
const EMPTY: Template[] = [];

type SortableColumn = { key: TemplateSortKey; header: string };

const fetchJson = async (url: string): Promise<TemplatePage> => {
  const res = await fetch(url);
  if (!res.ok) throw new Error(((await res.json().catch(() => ({}))) as { error?: string }).error ?? `HTTP ${res.status}`);
  return res.json();
};

function useDebounced<T>(value: T, ms: number): T {
  const [debounced, setDebounced] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setDebounced(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return debounced;
}

/** The template list: SWR fetches each page from the JSON API (search, sort, filter and paging in SQL). */
export function TemplateList({ slug }: { slug: string }) {
  const [q, setQ] = useState('');
  const [sort, setSort] = useState<TemplateSortKey>('name');
  const [dir, setDir] = useState<'asc' | 'desc'>('asc');
  const [archived, setArchived] = useState<'false' | 'true' | 'all'>('false');
  const [page, setPage] = useState(1);
  const pageSize = 25;
  const search = useDebounced(q, 250);
  useEffect(() => setPage(1), [search, archived, sort, dir]);

  const params = new URLSearchParams({ q: search, sort, dir, archived, page: String(page), pageSize: String(pageSize) });
  const { data, error, isLoading } = useSWR(`/api/v1/workspaces/${slug}/templates?${params}`, fetchJson, {
    keepPreviousData: true,
  });

  const columns = useMemo(() => {
    const sortable: SortableColumn[] = [
      { key: 'name', header: 'Name' },
      { key: 'description', header: 'Engine' },
      { key: 'boreMm', header: 'Bore' },
      { key: 'strokeMm', header: 'Stroke' },
      { key: 'rimDiameterMm', header: 'Rim Ø' },
      { key: 'faceDiameterMm', header: 'Face Ø' },
      { key: 'flangeDiameterMm', header: 'Flange Ø' },
      { key: 'staticAdvanceDeg', header: 'Advance' },
      { key: 'rotation', header: 'Rotation' },
      { key: 'updatedAt', header: 'Updated' },
    ];
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
            if (c.key === 'updatedAt') return formatWhen(row.updatedAt).slice(0, 10);
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
  }, [slug]);

  const table = useTable({ features, columns, data: data?.items ?? EMPTY });
  const total = data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / pageSize));

  const toggleSort = (key: TemplateSortKey) => {
    if (sort === key) setDir(dir === 'asc' ? 'desc' : 'asc');
    else {
      setSort(key);
      setDir('asc');
    }
  };

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="space-y-1">
          <label htmlFor="template-search" className="block text-sm font-medium">
            Search name and engine
          </label>
          <input id="template-search" type="search" value={q} onChange={(e) => setQ(e.target.value)} className={`${inputClass} w-72`} />
        </div>
        <div className="space-y-1">
          <label htmlFor="template-archived" className="block text-sm font-medium">
            Show
          </label>
          <select id="template-archived" value={archived} onChange={(e) => setArchived(e.target.value as typeof archived)} className={inputClass}>
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
        <button type="button" disabled={page <= 1} onClick={() => setPage(page - 1)} className="rounded border border-steel-300 px-3 py-1 disabled:opacity-50">
          Previous
        </button>
        <span>
          Page {page} of {pages}
        </span>
        <button type="button" disabled={page >= pages} onClick={() => setPage(page + 1)} className="rounded border border-steel-300 px-3 py-1 disabled:opacity-50">
          Next
        </button>
      </nav>
    </div>
  );
}
