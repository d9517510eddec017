import type { ImportDto } from '../../../../shared/schemas/import';
import { EmptyState } from '../../../components/ui/empty-state';
import { ImportActions } from './import-actions';

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

const statusClass: Record<ImportDto['status'], string> = {
  running: 'text-front',
  completed: 'text-clean',
  failed: 'text-failed',
  undone: 'text-ink-soft',
};

/** Every import: who, when, which file (name and SHA-256), how it went, and its actions. */
export function ImportHistory({ items }: { items: ImportDto[] }) {
  if (items.length === 0) {
    return (
      <EmptyState title="No imports yet">
        Upload a spreadsheet or an SD file above; each import is listed here and can be undone.
      </EmptyState>
    );
  }
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="sr-only">Past imports</caption>
        <thead>
          <tr className="border-b border-line text-left text-ink-soft">
            <th scope="col" className="py-1.5 pr-3 font-medium">
              When
            </th>
            <th scope="col" className="py-1.5 pr-3 font-medium">
              Who
            </th>
            <th scope="col" className="py-1.5 pr-3 font-medium">
              File
            </th>
            <th scope="col" className="py-1.5 pr-3 font-medium">
              Status
            </th>
            <th scope="col" className="py-1.5 pr-3 text-right font-medium">
              Rows
            </th>
            <th scope="col" className="py-1.5 pr-3 text-right font-medium">
              Added
            </th>
            <th scope="col" className="py-1.5 pr-3 text-right font-medium">
              Rejected
            </th>
            <th scope="col" className="py-1.5 pr-3 text-right font-medium">
              Duplicates
            </th>
            <th scope="col" className="py-1.5 font-medium">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {items.map((item) => (
            <tr key={item.id} data-import-id={item.id} className="border-b border-line/60 align-top last:border-0">
              <td className="whitespace-nowrap py-2 pr-3">{when(item.createdAt)}</td>
              <td className="py-2 pr-3">{item.user.name}</td>
              <td className="py-2 pr-3">
                <span className="text-ink">{item.fileName}</span>
                <span className="block font-mono text-xs text-ink-soft" title={`SHA-256 ${item.sha256}`}>
                  {item.format} · sha256 {item.sha256.slice(0, 12)}…
                </span>
              </td>
              <td className={`py-2 pr-3 font-medium ${statusClass[item.status]}`}>
                {item.status === 'running'
                  ? item.waitingToResume
                    ? `waiting to resume (${item.processed}/${item.total})`
                    : `running (${item.processed}/${item.total})`
                  : item.status}
              </td>
              <td className="figure py-2 pr-3 text-right">{item.total}</td>
              <td className="figure py-2 pr-3 text-right">{item.accepted}</td>
              <td className="figure py-2 pr-3 text-right">{item.rejected}</td>
              <td className="figure py-2 pr-3 text-right">{item.duplicates}</td>
              <td className="py-1.5">
                <ImportActions item={item} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
