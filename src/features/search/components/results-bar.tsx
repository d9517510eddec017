import type { SearchResponse, SearchSort, SearchView } from '../../../../shared/schemas/search';

const sortLabels: Record<SearchSort, string> = {
  relevance: 'Best match first',
  newest: 'Newest first',
  oldest: 'Oldest first',
  compound: 'Compound name',
  rf: 'Target Rf, low to high',
};

interface ResultsBarProps {
  result: SearchResponse | undefined;
  view: SearchView;
  sort: SearchSort;
  onView: (view: SearchView) => void;
  onSort: (sort: SearchSort) => void;
}

/** How many were found and how fast, what the structure was read as, and the view and order controls. */
export function ResultsBar({ result, view, sort, onView, onSort }: ResultsBarProps) {
  const unit = view === 'records' ? 'record' : 'compound';
  return (
    <div className="flex flex-wrap items-center justify-between gap-3">
      <div aria-live="polite" className="text-sm">
        {result && (
          <>
            <strong className="figure">{result.total}</strong> {unit}
            {result.total === 1 ? '' : 's'} found
            <span className="figure text-ink-soft"> · {result.tookMs} ms on the server</span>
            {result.structureSmiles && (
              <span className="text-ink-soft">
                {' '}
                · structure read as <code className="figure text-ink">{result.structureSmiles}</code>
              </span>
            )}
            {result.truncated && (
              <span className="text-partial"> · stopped at the structure limit: add words or filters to narrow it</span>
            )}
          </>
        )}
      </div>
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <div
          role="group"
          aria-label="Show results as"
          className="inline-flex overflow-hidden rounded-plate border border-line"
        >
          {(['records', 'compounds'] as const).map((option) => (
            <button
              key={option}
              type="button"
              aria-pressed={view === option}
              onClick={() => onView(option)}
              className={
                `px-3 py-1.5 ` +
                `${view === option ? 'bg-front-light font-medium text-front-dark' : 'bg-surface text-ink-soft hover:text-ink'}`
              }
            >
              {option === 'records' ? 'Table of records' : 'Grid of compounds'}
            </button>
          ))}
        </div>
        <label className="flex items-center gap-2">
          Order
          <select
            className="rounded-plate border border-line bg-surface px-2 py-1"
            value={sort}
            onChange={(event) => onSort(event.target.value as SearchSort)}
          >
            {Object.entries(sortLabels).map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </select>
        </label>
      </div>
    </div>
  );
}
