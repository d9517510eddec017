import type { UnitedCounts } from '../../../../shared/schemas/curation';

/** What the survivor will hold after the merge; nothing is dropped, bookmarks are counted once per person. */
export function MergeSummary({ survivorId, united, mergedIds }: { survivorId: number; united: UnitedCounts; mergedIds: number[] }) {
  return (
    <div className="space-y-1 text-sm">
      <p>
        Record <span className="figure">#{survivorId}</span> will hold{' '}
        <strong className="figure">{united.spots}</strong> spots, <strong className="figure">{united.photos}</strong> plate photos and{' '}
        <strong className="figure">{united.visualisations}</strong> visualisations; <strong className="figure">{united.bookmarks}</strong>{' '}
        {united.bookmarks === 1 ? 'person keeps a bookmark' : 'people keep their bookmarks'} on it, and{' '}
        <strong className="figure">{united.contributors}</strong> {united.contributors === 1 ? 'person stays' : 'people stay'} credited.
      </p>
      <p className="text-ink-soft">
        {mergedIds.map((id) => `#${id}`).join(', ')} will be marked merged and point to #{survivorId}; their rows are kept, and the merge can be undone once
        from the merge history.
      </p>
    </div>
  );
}
