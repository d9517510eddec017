import { Link } from 'react-router-dom';

/** "Merged into #N": shown on a merged record's page, linking to the record that holds its data now. */
export function MergedNotice({ mergedIntoId }: { mergedIntoId: number }) {
  return (
    <p role="status" className="rounded-plate border border-front/30 bg-front-light px-3 py-2 text-sm text-front-dark">
      This record was merged into{' '}
      <Link to={`/records/${mergedIntoId}`} className="font-semibold underline">
        record #{mergedIntoId}
      </Link>
      , which now holds its spots, photos and notes. Its own values are kept here for reference.
    </p>
  );
}
