import { useRecordHistory } from '../api/record-history';
import { fieldLabel, formatChangeValue } from './change-format';
import { formatDateTime } from '../../../lib/dates';

const actionWords: Record<string, string> = {
  create: 'created the record',
  update: 'edited',
  'photo-add': 'added a photo',
  'photo-remove': 'removed a photo',
  retire: 'retired the record',
  restore: 'restored the record',
  merge: 'merged records',
  unmerge: 'undid a merge',
  import: 'imported the record',
};

/** Every revision, newest first: who, when, and each field's value before and after. */
export function HistoryList({ recordId }: { recordId: number }) {
  const history = useRecordHistory(recordId);
  if (history.isLoading) return <p className="text-sm text-ink-soft">Loading history…</p>;
  if (history.error)
    return (
      <p role="alert" className="text-sm text-failed">
        {history.error.message}
      </p>
    );
  return (
    <ol className="space-y-3" aria-label="Revisions, newest first">
      {history.data?.revisions.map((revision) => (
        <li key={revision.number} className="border-l-2 border-line pl-3">
          <p className="text-sm">
            <span className="figure text-ink-soft">r{revision.number}</span>{' '}
            <span className="font-medium">{revision.author?.name ?? 'someone'}</span>{' '}
            {actionWords[revision.action] ?? revision.action}{' '}
            <time dateTime={revision.at} className="text-ink-soft">
              {formatDateTime(revision.at)}
            </time>
          </p>
          {revision.changes.length > 0 && revision.action !== 'photo-add' && revision.action !== 'photo-remove' && (
            <table className="mt-1 text-xs">
              <tbody>
                {revision.changes.map((change) => (
                  <tr key={change.field} className="align-top">
                    <th scope="row" className="pr-3 text-left font-normal text-ink-soft">
                      {fieldLabel(change.field)}
                    </th>
                    <td className="pr-2">
                      <del className="figure text-failed decoration-failed/60">
                        {formatChangeValue(change.field, change.from)}
                      </del>
                    </td>
                    <td aria-hidden="true" className="pr-2 text-ink-soft">
                      →
                    </td>
                    <td>
                      <ins className="figure text-clean no-underline">{formatChangeValue(change.field, change.to)}</ins>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </li>
      ))}
    </ol>
  );
}
