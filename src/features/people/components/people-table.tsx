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
import { TableBody } from '../../../components/ui/table-body';

const column = createColumnHelper<AdminUser>();

const roleMeaning: Record<Role, string> = {
  viewer: 'reads and bookmarks',
  member: 'contributes records',
  curator: 'edits any record, merges and imports',
  admin: 'manages people and roles',
};

interface PendingChange {
  person: AdminUser;
  change: { role: Role } | { status: 'active' | 'disabled' };
  question: string;
  done: string;
}

function describe(person: AdminUser, change: PendingChange['change']): Pick<PendingChange, 'question' | 'done'> {
  if ('role' in change) {
    return {
      question: `Make ${person.name} a ${change.role} (was ${person.role})? A ${change.role} ${roleMeaning[change.role]}.`,
      done: `${person.name} is now a ${change.role}.`,
    };
  }
  return change.status === 'disabled'
    ? {
        question: `Disable ${person.name}? They are signed out at once and cannot sign in until enabled again; their records stay.`,
        done: `${person.name} is disabled and signed out.`,
      }
    : {
        question: `Enable ${person.name} again? They can sign in with their password.`,
        done: `${person.name} can sign in again.`,
      };
}

/** Everyone in the group: sortable by any column; role and status change in place (the server refuses losing the last admin). */
export function PeopleTable({ people, meId }: { people: AdminUser[]; meId: number }) {
  const update = useUpdateUser();
  const [pending, setPending] = useState<PendingChange | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const ask = (person: AdminUser, change: PendingChange['change']) => {
    setDone(null);
    update.reset();
    setPending({ person, change, ...describe(person, change) });
  };
  const confirm = () => {
    if (!pending) return;
    const { person, change, done: message } = pending;
    update.mutate({ id: person.id, change }, { onSuccess: () => setDone(message) });
    setPending(null);
  };
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
            onChange={(e) => ask(c.row.original, { role: e.target.value as Role })}
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
              onClick={() => ask(person, { status: disabling ? 'disabled' : 'active' })}
            >
              {disabling ? 'Disable' : 'Enable'}
            </Button>
          );
        },
      }),
    ],
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [meId, update.isPending],
  );
  const table = useReactTable({
    data: people,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  return (
    <div className="relative overflow-x-auto">
      {pending && (
        <div
          role="alertdialog"
          aria-labelledby="people-confirm"
          className="mb-3 rounded-plate border border-spot/50 bg-spot-light p-3 text-sm"
        >
          <p id="people-confirm">{pending.question}</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button
              size="sm"
              variant={'status' in pending.change && pending.change.status === 'disabled' ? 'danger' : 'primary'}
              onClick={confirm}
            >
              {'role' in pending.change
                ? `Make ${pending.change.role}`
                : pending.change.status === 'disabled'
                  ? 'Disable'
                  : 'Enable'}
            </Button>
            <Button size="sm" onClick={() => setPending(null)}>
              Cancel
            </Button>
          </div>
        </div>
      )}
      {done && (
        <p role="status" className="mb-2 rounded-plate border border-clean/40 bg-surface px-3 py-2 text-sm">
          {done}
        </p>
      )}
      {update.error && (
        <p role="alert" className="mb-2 text-sm text-failed">
          {update.error.message}
        </p>
      )}
      <table className="w-full text-sm">
        <caption className="sr-only">People in the group</caption>
        <thead className="text-left text-xs uppercase tracking-wide text-ink-soft">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                return (
                  <th
                    key={h.id}
                    className="py-1 pr-3 font-medium"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                  >
                    {h.column.getCanSort() ? (
                      <button
                        type="button"
                        className="min-h-6 uppercase tracking-wide hover:text-ink"
                        onClick={h.column.getToggleSortingHandler()}
                      >
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
        <TableBody table={table} rowClassName="border-t border-line" cellClassName="py-2 pr-3" />
      </table>
    </div>
  );
}
