import { useMemo, useState } from 'react';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { roles, type Role } from '../../../../shared/schemas/auth';
import type { AdminUser } from '../../../../shared/schemas/accounts';
import { useUpdateUser } from '../api/users';
import { whenShort } from './format';

const column = createColumnHelper<AdminUser>();

/** Everyone in the group: sortable by any column; role and status change in place (the server refuses losing the last admin). */
export function PeopleTable({ people, meId }: { people: AdminUser[]; meId: number }) {
  const update = useUpdateUser();
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }]);
  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (c) => (
          <span className="font-medium">
            {c.getValue()}
            {c.row.original.id === meId && <span className="ml-1 text-xs text-ink-soft">(you)</span>}
          </span>
        ),
      }),
      column.accessor('email', { header: 'E-mail' }),
      column.accessor('role', {
        header: 'Role',
        cell: (c) => (
          <select
            aria-label={`Role of ${c.row.original.name}`}
            className={`${controlClass} min-h-8 py-1 text-sm`}
            value={c.getValue()}
            disabled={update.isPending}
            onChange={(e) => update.mutate({ id: c.row.original.id, change: { role: e.target.value as Role } })}
          >
            {roles.map((r) => (
              <option key={r} value={r}>
                {r}
              </option>
            ))}
          </select>
        ),
      }),
      column.accessor('status', {
        header: 'Status',
        cell: (c) => <span className={c.getValue() === 'active' ? 'text-clean' : 'text-failed'}>{c.getValue()}</span>,
      }),
      column.accessor('lastSignInAt', {
        header: 'Last sign-in',
        sortingFn: (a, b) => Date.parse(a.original.lastSignInAt ?? '0') - Date.parse(b.original.lastSignInAt ?? '0'),
        cell: (c) => <span className="figure">{whenShort(c.getValue())}</span>,
      }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) => {
          const person = c.row.original;
          const disabling = person.status === 'active';
          return (
            <Button
              size="sm"
              variant={disabling ? 'danger' : 'secondary'}
              disabled={update.isPending}
              aria-label={`${disabling ? 'Disable' : 'Enable'} ${person.name}`}
              onClick={() => update.mutate({ id: person.id, change: { status: disabling ? 'disabled' : 'active' } })}
            >
              {disabling ? 'Disable' : 'Enable'}
            </Button>
          );
        },
      }),
    ],
    [meId, update],
  );
  const table = useReactTable({ data: people, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });

  return (
    <div className="overflow-x-auto">
      {update.error && <p role="alert" className="mb-2 text-sm text-failed">{update.error.message}</p>}
      <table className="w-full text-sm">
        <caption className="sr-only">People in the group</caption>
        <thead className="text-left text-xs uppercase tracking-wide text-ink-soft">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                return (
                  <th key={h.id} className="py-1 pr-3 font-medium" aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}>
                    {h.column.getCanSort() ? (
                      <button type="button" className="uppercase tracking-wide hover:text-ink" onClick={h.column.getToggleSortingHandler()}>
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        {sorted ? (sorted === 'asc' ? ' ▲' : ' ▼') : ''}
                      </button>
                    ) : (
                      flexRender(h.column.columnDef.header, h.getContext())
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-t border-line">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="py-2 pr-3">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
