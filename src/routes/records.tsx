import { Link } from 'react-router-dom';
import { buttonClass, Button } from '../components/ui/button';
import { EmptyState } from '../components/ui/empty-state';
import { PageLoading } from '../components/ui/page-loading';
import { useHasRole } from '../features/auth/api/session';
import { useRecords } from '../features/records/api/list-records';
import { RecordsTable } from '../features/records/components/records-table';
import { RecordFilters } from '../features/records/components/record-filters';
import { ColumnChooser } from '../features/records/components/column-chooser';
import { useRecordsUrl } from '../features/records/hooks/use-records-url';
import { RecordGroups } from '../features/records/components/record-groups';
import { BookmarkToggle } from '../features/bookmarks/components/bookmark-toggle';

/** Every condition record, sorted, filtered and paged on the server; the view lives in the URL. */
export default function RecordsPage() {
  const { query, columns, update, params } = useRecordsUrl();
  const grouped = params.get('group') === 'compound';
  const records = useRecords(query);
  const canContribute = useHasRole('member');
  const page = Number(query.page ?? 1);
  const pageSize = Number(query.pageSize ?? 25);
  const total = records.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <section className="space-y-4">
      <header className="flex flex-wrap items-baseline justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold">Condition records</h1>
          <p className="mt-1 text-sm text-ink-soft">
            {records.data ? `${total} record${total === 1 ? '' : 's'} match` : ' '}
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <div
            role="group"
            aria-label="Show the records"
            className="inline-flex rounded-plate border border-line bg-surface text-sm"
          >
            <button
              type="button"
              aria-pressed={!grouped}
              className={`min-h-10 px-3 ${!grouped ? 'bg-front-light font-medium text-front-dark' : 'text-ink-soft'}`}
              onClick={() => update({ group: null }, false)}
            >
              One by one
            </button>
            <button
              type="button"
              aria-pressed={grouped}
              className={`min-h-10 border-l border-line px-3 ${grouped ? 'bg-front-light font-medium text-front-dark' : 'text-ink-soft'}`}
              onClick={() => update({ group: 'compound', sort: 'compound', order: 'asc' })}
            >
              By compound
            </button>
          </div>
          {!grouped && <ColumnChooser visible={columns} onChange={(next) => update({ cols: next.join(',') }, false)} />}
          {canContribute && (
            <Link to="/contribute" className={buttonClass('primary')}>
              Contribute a record
            </Link>
          )}
        </div>
      </header>
      <RecordFilters query={query} onChange={(changes) => update(changes)} />
      {records.isLoading ? (
        <PageLoading label="Loading records…" />
      ) : records.error ? (
        <p role="alert" className="text-failed">
          {records.error.message}
        </p>
      ) : total === 0 ? (
        <EmptyState
          title="No record matches these filters"
          action={
            canContribute ? (
              <Link to="/contribute" className={buttonClass('secondary', 'sm')}>
                Contribute one
              </Link>
            ) : undefined
          }
        >
          Loosen a filter, or search by structure on the search page.
        </EmptyState>
      ) : (
        <>
          {grouped ? (
            <RecordGroups
              records={records.data!.items}
              action={(record) => (
                <BookmarkToggle
                  recordId={record.id}
                  label={`record ${record.id}, ${record.compound.name ?? record.compound.canonicalSmiles}`}
                />
              )}
            />
          ) : (
            <RecordsTable
              records={records.data!.items}
              visible={columns}
              sort={String(query.sort)}
              order={query.order === 'asc' ? 'asc' : 'desc'}
              onSort={(sort, order) => update({ sort, order })}
              action={(record) => (
                <BookmarkToggle
                  recordId={record.id}
                  label={`record ${record.id}, ${record.compound.name ?? record.compound.canonicalSmiles}`}
                />
              )}
            />
          )}
          <nav aria-label="Pages" className="flex flex-wrap items-center gap-3 text-sm">
            <Button size="sm" disabled={page <= 1} onClick={() => update({ page: page - 1 }, false)}>
              Previous
            </Button>
            <span className="figure">
              page {page} of {pages}
            </span>
            <Button size="sm" disabled={page >= pages} onClick={() => update({ page: page + 1 }, false)}>
              Next
            </Button>
            <label className="ml-auto flex items-center gap-2">
              Rows per page
              <select
                className="rounded-plate border border-line bg-surface px-2 py-1"
                value={pageSize}
                onChange={(event) => update({ pageSize: event.target.value })}
              >
                {[10, 25, 50, 100].map((size) => (
                  <option key={size} value={size}>
                    {size}
                  </option>
                ))}
              </select>
            </label>
          </nav>
        </>
      )}
    </section>
  );
}
