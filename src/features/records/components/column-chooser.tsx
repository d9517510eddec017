import { recordColumns } from './record-columns';

/** Which columns the table shows; the choice is kept in the URL with the rest of the view. */
export function ColumnChooser({ visible, onChange }: { visible: string[]; onChange: (columns: string[]) => void }) {
  return (
    <details className="relative">
      <summary className="cursor-pointer list-none rounded-plate border border-line bg-surface px-3 py-1.5 text-sm hover:bg-plate">
        Columns
      </summary>
      <fieldset className="absolute right-0 z-10 mt-1 w-56 space-y-1 rounded-plate border border-line bg-surface p-3 shadow-sm">
        <legend className="sr-only">Columns to show</legend>
        {recordColumns.map((column) => (
          <label key={column.id} className="flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              checked={visible.includes(column.id)}
              disabled={column.id === 'compound'}
              onChange={(event) =>
                onChange(
                  event.target.checked
                    ? recordColumns.map((c) => c.id).filter((id) => id === column.id || visible.includes(id))
                    : visible.filter((id) => id !== column.id),
                )
              }
            />
            {column.meta.label}
          </label>
        ))}
      </fieldset>
    </details>
  );
}
