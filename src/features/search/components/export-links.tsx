import { buttonClass } from '../../../components/ui/button';
import { searchApiParams, type SearchState } from '../hooks/use-search-url';

/** Downloads of every record the search finds (not only this page), with the same words, structure and filters. */
export function ExportLinks({ state }: { state: SearchState }) {
  const query = searchApiParams(state, { paged: false }).toString();
  return (
    <div className="flex items-center gap-2 text-sm" role="group" aria-label="Export these results">
      <span className="text-ink-soft">Export</span>
      <a href={`/api/export.csv?${query}`} download className={buttonClass('secondary', 'sm')}>
        CSV
      </a>
      <a href={`/api/export.sdf?${query}`} download className={buttonClass('secondary', 'sm')}>
        SDF
      </a>
    </div>
  );
}
