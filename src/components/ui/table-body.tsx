import type { ReactNode } from 'react';
import { flexRender, type Table } from '@tanstack/react-table';

interface TableBodyProps<T> {
  table: Table<T>;
  rowClassName: string;
  cellClassName: string;
  /** A leading cell before the table's own columns (e.g. a bookmark toggle), rendered for each row. */
  lead?: (row: T) => ReactNode;
}

/** The body of a @tanstack/react-table table: one row a record, one cell a visible column. */
export function TableBody<T>({ table, rowClassName, cellClassName, lead }: TableBodyProps<T>) {
  return (
    <tbody>
      {table.getRowModel().rows.map((row) => (
        <tr key={row.id} className={rowClassName}>
          {lead && <td className="px-2 py-2">{lead(row.original)}</td>}
          {row.getVisibleCells().map((cell) => (
            <td key={cell.id} className={cellClassName}>
              {flexRender(cell.column.columnDef.cell, cell.getContext())}
            </td>
          ))}
        </tr>
      ))}
    </tbody>
  );
}
