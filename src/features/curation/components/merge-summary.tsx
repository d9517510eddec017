import type { MergePreview, UnitedCounts } from '../../../../shared/schemas/curation';
import { spotsText } from './merge-field-table';
import { unitedValues } from './united-values';

/** What the survivor will hold after the merge; nothing is dropped, bookmarks are counted once per person. */
export function MergeSummary({
  survivorId,
  united,
  mergedIds,
  records,
}: {
  survivorId: number;
  united: UnitedCounts;
  mergedIds: number[];
  records: MergePreview['records'];
}) {
  const values = unitedValues(records, survivorId);
  return (
    <div className="space-y-1 text-sm">
      <dl className="grid grid-cols-1 gap-x-3 gap-y-1 sm:grid-cols-[8rem_minmax(0,1fr)]">
        <dt className="font-medium">Spots</dt>
        <dd className="figure text-xs">{spotsText(values.spots)}</dd>
        <dt className="font-medium">Visualisation</dt>
        <dd>{values.stains.map((stain) => stain.label).join(', ') || '—'}</dd>
      </dl>
      {values.leftBehind > 0 && (
        <p className="text-ink-soft">
          A second target spot or a stain already named stays on its merged record ({values.leftBehind} in all), so the
          united record has one target and names each stain once.
        </p>
      )}
      <p>
        Record <span className="figure">#{survivorId}</span> will also hold{' '}
        <strong className="figure">{united.photos}</strong> plate photos;{' '}
        <strong className="figure">{united.bookmarks}</strong>{' '}
        {united.bookmarks === 1 ? 'person keeps a bookmark' : 'people keep their bookmarks'} on it, and{' '}
        <strong className="figure">{united.contributors}</strong>{' '}
        {united.contributors === 1 ? 'person stays' : 'people stay'} credited.
      </p>
      <p className="text-ink-soft">
        {mergedIds.map((id) => `#${id}`).join(', ')} will be marked merged and point to #{survivorId}; their rows are
        kept, and the merge can be undone once from the merge history.
      </p>
    </div>
  );
}
