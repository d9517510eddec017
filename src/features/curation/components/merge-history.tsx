import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageLoading } from '../../../components/ui/page-loading';
import { mergeableFieldLabels, type MergeableField, type MergeHistoryItem } from '../../../../shared/schemas/curation';
import { useMerges, useUnmerge } from '../api/merges';
import { day } from './format';

const recordLink = (id: number) => (
  <Link
    key={id}
    to={`/records/${id}`}
    className="inline-block min-h-6 min-w-6 py-0.5 figure text-front hover:underline"
  >
    #{id}
  </Link>
);

function chosenFields(item: MergeHistoryItem): string {
  const taken = Object.entries(item.fields).filter(([, from]) => from !== item.survivorId);
  if (taken.length === 0) return 'all fields from the survivor';
  return taken
    .map(([field, from]) => `${mergeableFieldLabels[field as MergeableField] ?? field} from #${from}`)
    .join('; ');
}

/** Undo with a second, explicit click; explains when the merge can no longer be undone. */
function UnmergeAction({ item }: { item: MergeHistoryItem }) {
  const [confirming, setConfirming] = useState(false);
  const unmerge = useUnmerge();
  if (item.undoneAt)
    return (
      <span className="text-xs text-ink-soft">
        undone {day(item.undoneAt)} by {item.undoneBy?.name}
      </span>
    );
  if (item.blockedReason) return <span className="text-xs text-ink-soft">{item.blockedReason}</span>;
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      {confirming ? (
        <>
          <Button size="sm" variant="danger" disabled={unmerge.isPending} onClick={() => unmerge.mutate(item.id)}>
            Confirm unmerge #{item.id}
          </Button>
          <Button size="sm" variant="quiet" onClick={() => setConfirming(false)}>
            Keep merged
          </Button>
        </>
      ) : (
        <Button size="sm" onClick={() => setConfirming(true)}>
          Unmerge
        </Button>
      )}
      {unmerge.error && (
        <span role="alert" className="text-xs text-failed">
          {unmerge.error.message}
        </span>
      )}
    </span>
  );
}

/** Merges, newest first: who merged what into which survivor, the fields taken, and an Unmerge button. */
export function MergeHistory({ recordId }: { recordId?: number }) {
  const merges = useMerges(recordId);
  if (merges.isLoading) return <PageLoading label="Loading merges…" />;
  if (merges.error)
    return (
      <p role="alert" className="text-failed">
        {merges.error.message}
      </p>
    );
  const items = merges.data?.items ?? [];
  if (items.length === 0)
    return <EmptyState title="No merges yet">Merges you confirm appear here, and each can be undone once.</EmptyState>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <thead className="text-xs text-ink-soft">
          <tr className="border-b border-line">
            <th className="py-1.5 pr-3 font-medium">Merge</th>
            <th className="py-1.5 pr-3 font-medium">Survivor</th>
            <th className="py-1.5 pr-3 font-medium">Merged</th>
            <th className="py-1.5 pr-3 font-medium">Fields taken</th>
            <th className="py-1.5 pr-3 font-medium">By</th>
            <th className="py-1.5 font-medium">Undo</th>
          </tr>
        </thead>
        <tbody>
          {items.map((item) => (
            <tr
              key={item.id}
              aria-label={`Merge ${item.id}`}
              className="border-b border-line/60 align-top last:border-0"
            >
              <td className="figure py-2 pr-3">#{item.id}</td>
              <td className="py-2 pr-3">{recordLink(item.survivorId)}</td>
              <td className="space-x-1 py-2 pr-3">{item.mergedIds.map(recordLink)}</td>
              <td className="py-2 pr-3 text-ink-soft">{chosenFields(item)}</td>
              <td className="py-2 pr-3">
                {item.actor.name} <span className="text-xs text-ink-soft">{day(item.at)}</span>
              </td>
              <td className="py-2">
                <UnmergeAction item={item} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
