import type { ReactNode } from 'react';
import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type SortingState,
  type VisibilityState,
} from '@tanstack/react-table';
import type { RecordListItem } from '../../../../shared/schemas/record';
import { RecordRows } from '../../../components/record-rows';
import { recordColumns } from './record-columns';
import { TableBody } from '../../../components/ui/table-body';

interface RecordsTableProps {
  records: RecordListItem[];
  visible: string[];
  sort: string;
  order: 'asc' | 'desc';
  onSort: (sortKey: string, order: 'asc' | 'desc') => void;
  /** A control shown first in each row (the page passes the bookmark star). */
  action?: (record: RecordListItem) => ReactNode;
}

/** The records as a table; sorting is done by the server (manualSorting) and asked for through onSort. */
const bodyRow = 'border-b border-line/70 align-middle last:border-0 hover:bg-plate/60';

export function RecordsTable({ records, visible, sort, order, onSort, action }: RecordsTableProps) {
  const sortedColumn = recordColumns.find((column) => column.meta.sortKey === sort)?.id;
  const sorting: SortingState = sortedColumn ? [{ id: sortedColumn, desc: order === 'desc' }] : [];
  const columnVisibility: VisibilityState = Object.fromEntries(
    recordColumns.map((column) => [column.id, visible.includes(column.id)]),
  );
  const table = useReactTable({
    data: records,
    columns: recordColumns,
    state: { sorting, columnVisibility },
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (row) => String(row.id),
  });
  const sortable = recordColumns.filter((column) => column.meta.sortKey && visible.includes(column.id));
  return (
    <>
      {/* On a phone the records are cards, sorted with one menu; from 640 px up, the table. */}
      <div className="space-y-2 sm:hidden">
        <label className="flex items-center gap-2 text-sm">
          Sort by
          <select
            className="min-h-10 flex-1 rounded-plate border border-line bg-surface px-2"
            value={`${sort}:${order}`}
            onChange={(event) => {
              const [key, dir] = event.target.value.split(':');
              onSort(key!, dir === 'asc' ? 'asc' : 'desc');
            }}
          >
            {sortable.flatMap((column) => [
              <option key={`${column.id}-desc`} value={`${column.meta.sortKey}:desc`}>
                {column.meta.label} ↓
              </option>,
              <option key={`${column.id}-asc`} value={`${column.meta.sortKey}:asc`}>
                {column.meta.label} ↑
              </option>,
            ])}
          </select>
        </label>
        <div className="rounded-plate border border-line bg-surface px-3">
          <RecordRows records={records} action={action} />
        </div>
      </div>
      <div className="relative hidden overflow-x-auto rounded-plate border border-line bg-surface sm:block">
        <table className="w-full text-sm">
          <thead className="border-b border-line bg-plate text-left text-xs text-ink-soft">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {action && (
                  <th scope="col" className="w-10 px-2 py-2">
                    <span className="sr-only">Bookmark</span>
                  </th>
                )}
                {group.headers.map((header) => {
                  const meta = (header.column.columnDef as (typeof recordColumns)[number]).meta;
                  const active = meta.sortKey === sort;
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      className="px-3 py-2 font-medium"
                      aria-sort={active ? (order === 'asc' ? 'ascending' : 'descending') : undefined}
                    >
                      {meta.sortKey ? (
                        <button
                          type="button"
                          className="inline-flex min-h-6 items-center gap-1 hover:text-ink"
                          onClick={() => onSort(meta.sortKey as string, active && order === 'desc' ? 'asc' : 'desc')}
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true" className="figure">
                            {active ? (order === 'asc' ? '▲' : '▼') : '↕'}
                          </span>
                          <span className="sr-only">
                            {active ? `sorted ${order === 'asc' ? 'ascending' : 'descending'}; ` : ''}sort by{' '}
                            {meta.label}
                          </span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <TableBody table={table} rowClassName={bodyRow} cellClassName="px-3 py-2" lead={action} />
        </table>
      </div>
    </>
  );
}
