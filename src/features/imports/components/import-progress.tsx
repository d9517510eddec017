import type { ImportDto } from '../../../../shared/schemas/import';
import { countsLine } from '../api/watch';
import { ImportActions } from './import-actions';

const statusText: Record<ImportDto['status'], string> = {
  running: 'Importing…',
  completed: 'Import finished',
  failed: 'Import stopped',
  undone: 'Import undone',
};

const formatSeconds = (seconds: number) => (seconds < 90 ? `${seconds} s` : `${Math.round(seconds / 60)} min`);

/** The import just started: a progress bar while it runs, then its counts and what to do next. */
export function ImportProgress({ item }: { item: ImportDto }) {
  const percent = item.total === 0 ? 100 : Math.round((100 * item.processed) / item.total);
  return (
    <div className="space-y-3" aria-live="polite">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className={`font-semibold ${item.status === 'failed' ? 'text-failed' : 'text-ink'}`}>
          {statusText[item.status]}: {item.fileName}
        </p>
        <p className="figure text-sm text-ink-soft">
          {item.processed} / {item.total} rows ({percent} %)
        </p>
      </div>
      <div
        role="progressbar"
        aria-label={`Rows of ${item.fileName} imported`}
        aria-valuemin={0}
        aria-valuemax={item.total}
        aria-valuenow={item.processed}
        className="h-2 overflow-hidden rounded-plate bg-plate"
      >
        <div
          className={`h-full ${item.status === 'failed' ? 'bg-failed' : 'bg-front'} transition-[width]`}
          style={{ width: `${percent}%` }}
        />
      </div>
      {item.status === 'running' && item.rate && (
        <p className="figure text-sm text-ink-soft" data-testid="import-rate">
          {item.rate.rowsPerSecond > 0 ? `${item.rate.rowsPerSecond} rows/s` : 'starting'}
          {item.rate.secondsLeft !== null && ` · about ${formatSeconds(item.rate.secondsLeft)} left`} · you can leave
          this page and come back
        </p>
      )}
      {item.waitingToResume && (
        <p role="status" className="text-sm text-partial">
          Waiting to resume: {item.error} It continues by itself from row {item.lastCommittedRow + 1} as soon as the
          database answers again.
        </p>
      )}
      <p className="text-sm" data-testid="import-counts">
        {countsLine(item)}
        {item.newCompounds > 0 && (
          <span className="text-ink-soft">
            {' '}
            · {item.newCompounds} new compound{item.newCompounds === 1 ? '' : 's'}
          </span>
        )}
        {item.warned > 0 && <span className="text-partial"> · {item.warned} came in with warnings</span>}
        {item.blankRows > 0 && (
          <span className="text-ink-soft">
            {' '}
            · {item.blankRows} blank row{item.blankRows === 1 ? '' : 's'} skipped
          </span>
        )}
      </p>
      {item.status === 'failed' && (
        <p className="text-sm text-failed">
          {item.error} Rows 1–{item.lastCommittedRow} are committed; nothing of the batch in progress was kept.
        </p>
      )}
      {item.status === 'undone' && (
        <p className="text-sm text-ink-soft">
          {item.retiredRecords ?? 0} records retired (kept for audit, reason “import {item.id} undone”).
        </p>
      )}
      <ImportActions item={item} size="md" />
    </div>
  );
}
