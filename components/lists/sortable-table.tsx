'use client';

import { tableFeatures, useTable, type ColumnDef, type RowData } from '@tanstack/react-table';
import { ScrollRegion } from '@/components/shell/scroll-region';

export const listFeatures = tableFeatures({});

type Sort = { sort: string; dir: 'asc' | 'desc' };

/**
 * A list's table: one row a record, the sortable columns' headers are buttons that sort by
 * them (again: the other way), and the table scrolls in its own named region on a phone.
 */
export function SortableTable<T extends RowData>({
  label,
  columns,
  rows,
  sortable,
  view,
  onSort,
  cellClassName = '',
}: {
  label: string;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- each column has its own value type, as helper.columns makes them
  columns: Array<ColumnDef<typeof listFeatures, T, any>>;
  rows: T[];
  sortable: ReadonlySet<string>;
  view: Sort;
  onSort: (next: Sort & { page: 1 }) => void;
  cellClassName?: string;
}) {
  const table = useTable({ features: listFeatures, columns, data: rows });
  const toggle = (key: string) => onSort(view.sort === key ? { sort: key, dir: view.dir === 'asc' ? 'desc' : 'asc', page: 1 } : { sort: key, dir: 'asc', page: 1 });
  return (
    <ScrollRegion label={label} className="rounded-lg border border-steel-200 dark:border-steel-800">
      <table className="min-w-full text-sm">
        <thead className="bg-steel-50 text-left dark:bg-steel-900">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const key = header.column.id;
                const active = view.sort === key;
                return (
                  <th key={header.id} scope="col" aria-sort={active ? (view.dir === 'asc' ? 'ascending' : 'descending') : 'none'} className="whitespace-nowrap px-2 py-2 font-semibold">
                    {sortable.has(key) ? (
                      <button type="button" onClick={() => toggle(key)} className="inline-flex min-h-11 items-center gap-1 hover:underline">
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
                <td key={cell.id} className={`whitespace-nowrap px-2 py-2 ${cellClassName}`}>
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
