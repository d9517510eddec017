import type { ImportRowResult } from '../../../../shared/schemas/import';

const labels: Record<ImportRowResult['result'], { text: string; className: string }> = {
  accepted: { text: 'added', className: 'border-clean/40 text-clean' },
  duplicate: { text: 'duplicate', className: 'border-line text-ink-soft' },
  rejected: { text: 'rejected', className: 'border-failed/50 text-failed' },
};

/** What happens (or happened) to a row: added, a duplicate of a stored record, or rejected. */
export function RowResultBadge({ result }: { result: ImportRowResult['result'] }) {
  const label = labels[result];
  return (
    <span className={`inline-block rounded-plate border px-1.5 py-0.5 text-xs font-medium ${label.className}`}>
      {label.text}
    </span>
  );
}
