import { Link } from 'react-router-dom';
import type { BookmarkDto } from '../../../../shared/schemas/bookmark';
import { PlateStrip } from '../../../components/plate-strip';
import { StructureImage } from '../../../components/structure-image';
import { OutcomeBadge } from '../../../components/ui/outcome-badge';
import { BookmarkNote } from './bookmark-note';
import { BookmarkToggle } from './bookmark-toggle';

const labelOf = (bookmark: BookmarkDto) =>
  bookmark.record
    ? `record ${bookmark.record.id}, ${bookmark.record.compound.name ?? bookmark.record.compound.canonicalSmiles}`
    : `compound ${bookmark.compound?.name ?? bookmark.compound?.canonicalSmiles ?? bookmark.compoundId}`;

function Target({ bookmark }: { bookmark: BookmarkDto }) {
  const { record, compound } = bookmark;
  if (record) {
    return (
      <div className="flex flex-wrap items-center gap-3">
        <StructureImage compoundId={record.compound.id} name={record.compound.name ?? undefined} size="sm" />
        <PlateStrip
          lanes={[{ spots: record.spots.map((spot) => ({ rf: spot.rf, role: spot.role })) }]}
          title={`Plate of record ${record.id}`}
        />
        <div className="min-w-0 space-y-0.5">
          <Link
            to={`/records/${record.id}`}
            className="inline-block min-h-6 py-0.5 font-medium text-front hover:underline"
          >
            {record.compound.name ?? record.compound.canonicalSmiles}
          </Link>
          <p className="figure text-xs">
            {record.eluentSummary.notation} · Rf {record.targetRf?.toFixed(2) ?? '—'}
          </p>
          <p className="flex flex-wrap items-center gap-2 text-xs text-ink-soft">
            <OutcomeBadge outcome={record.outcome} /> {record.stationaryPhaseLabel}
            {record.status !== 'active' && <span className="uppercase text-failed">{record.status}</span>}
          </p>
        </div>
      </div>
    );
  }
  if (compound) {
    return (
      <div className="flex flex-wrap items-center gap-3">
        <StructureImage compoundId={compound.id} name={compound.name ?? undefined} size="sm" />
        <div>
          <Link
            to={`/compounds/${compound.id}`}
            className="inline-block min-h-6 py-0.5 font-medium text-front hover:underline"
          >
            {compound.name ?? compound.canonicalSmiles}
          </Link>
          <p className="figure text-xs text-ink-soft">
            {compound.formula} · {compound.recordCount} active record{compound.recordCount === 1 ? '' : 's'}
          </p>
        </div>
      </div>
    );
  }
  return <p className="text-sm text-ink-soft">This item is no longer available.</p>;
}

/** Bookmarks with what they point to; `compact` leaves the notes out (for the home page). */
export function BookmarkList({ bookmarks, compact = false }: { bookmarks: BookmarkDto[]; compact?: boolean }) {
  return (
    <ul className="divide-y divide-line">
      {bookmarks.map((bookmark) => (
        <li key={bookmark.id} className="flex items-start gap-3 py-3 first:pt-0 last:pb-0">
          <BookmarkToggle
            recordId={bookmark.recordId ?? undefined}
            compoundId={bookmark.compoundId ?? undefined}
            label={labelOf(bookmark)}
          />
          <div className="min-w-0 flex-1 space-y-2">
            <Target bookmark={bookmark} />
            {compact ? (
              bookmark.note && <p className="text-xs text-ink-soft">{bookmark.note}</p>
            ) : (
              <BookmarkNote id={bookmark.id} note={bookmark.note} label={labelOf(bookmark)} />
            )}
          </div>
        </li>
      ))}
    </ul>
  );
}
