import { useState } from 'react';
import { Link, useLocation } from 'react-router-dom';
import type { SearchCompoundHit, SearchRecordHit } from '../../shared/schemas/search';
import { buttonClass, Button } from '../components/ui/button';
import { EmptyState } from '../components/ui/empty-state';
import { PageLoading } from '../components/ui/page-loading';
import { BookmarkToggle } from '../features/bookmarks/components/bookmark-toggle';
import { useSearch } from '../features/search/api/search';
import { ExportLinks } from '../features/search/components/export-links';
import { Pager } from '../features/search/components/pager';
import { ResultsBar } from '../features/search/components/results-bar';
import { ResultsGrid } from '../features/search/components/results-grid';
import { ResultsTable } from '../features/search/components/results-table';
import { SearchFilters } from '../features/search/components/search-filters';
import { SearchForm } from '../features/search/components/search-form';
import { searchApiParams, useSearchUrl } from '../features/search/hooks/use-search-url';

const recordStar = (hit: SearchRecordHit) => (
  <BookmarkToggle
    recordId={hit.recordId}
    label={`record ${hit.recordId}, ${hit.record.compound.name ?? hit.record.compound.canonicalSmiles}`}
  />
);
const compoundStar = (hit: SearchCompoundHit) => (
  <BookmarkToggle compoundId={hit.id} label={`compound ${hit.compound.name ?? hit.compound.canonicalSmiles}`} />
);

function CopyLink() {
  const [copied, setCopied] = useState(false);
  const copy = async () => {
    await navigator.clipboard?.writeText(window.location.href).catch(() => undefined);
    setCopied(true);
    setTimeout(() => setCopied(false), 2_000);
  };
  return (
    <Button
      size="sm"
      variant="quiet"
      onClick={() => void copy()}
      title="The link holds the whole search: words, structure, filters, view and page"
    >
      {copied ? 'Link copied' : 'Copy link to this search'}
    </Button>
  );
}

/** Search: words, a similar structure or a substructure, with filters; results as a table of records or a grid of compounds. */
export default function SearchPage() {
  const { state, update } = useSearchUrl();
  const location = useLocation();
  const ready = state.mode === 'text' || !!state.structure;
  const search = useSearch(searchApiParams(state).toString(), ready);
  const result = search.data;
  const records = result?.items.filter((item): item is SearchRecordHit => item.kind === 'record') ?? [];
  const compounds = result?.items.filter((item): item is SearchCompoundHit => item.kind === 'compound') ?? [];
  return (
    <section className="space-y-4">
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <div>
          <h1 className="text-2xl font-semibold">Search</h1>
          <p className="mt-1 text-sm text-ink-soft">
            Find how the group purified a compound, or anything like it. Only active records are searched.
          </p>
        </div>
        <CopyLink />
      </header>
      <SearchForm state={state} onSearch={(changes) => update(changes)} />
      <SearchFilters filters={state.filters} onChange={(changes) => update(changes)} />
      {!ready ? (
        <EmptyState title="Draw or paste a structure">
          A similarity or substructure search needs a structure: draw it, paste a SMILES or molfile, or drop a .mol
          file, then press Search.
        </EmptyState>
      ) : (
        <>
          <div className="flex flex-wrap items-center justify-between gap-3">
            <ResultsBar
              result={result}
              view={state.view}
              sort={state.sort}
              onView={(view) => update({ view })}
              onSort={(sort) => update({ sort })}
            />
            <ExportLinks state={state} />
          </div>
          {search.isLoading ? (
            <PageLoading label="Searching…" />
          ) : search.error ? (
            <p role="alert" className="rounded-plate border border-failed/40 bg-surface p-3 text-failed">
              {search.error.message}
            </p>
          ) : result && result.total === 0 ? (
            <EmptyState
              title="Nothing found"
              action={
                <Link to="/contribute" className={buttonClass('secondary', 'sm')}>
                  Contribute a record
                </Link>
              }
            >
              {state.mode === 'similar' ? 'Lower the least similarity, ' : 'Try fewer or other words, '}
              remove a filter, or switch between similar and substructure. If nobody has purified it yet, record it when
              you do.
            </EmptyState>
          ) : result ? (
            <div
              role="region"
              aria-label="Search results"
              aria-busy={search.isFetching}
              data-location={location.search}
              className={search.isPlaceholderData ? 'opacity-60 transition-opacity' : ''}
            >
              {state.view === 'records' ? (
                <ResultsTable hits={records} action={recordStar} />
              ) : (
                <ResultsGrid hits={compounds} action={compoundStar} />
              )}
              <div className="mt-3">
                <Pager
                  page={state.page}
                  pageSize={state.pageSize}
                  total={result.total}
                  onPage={(page) => update({ page }, false)}
                  onPageSize={(pageSize) => update({ pageSize })}
                />
              </div>
            </div>
          ) : null}
        </>
      )}
    </section>
  );
}
