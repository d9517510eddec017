import { Link } from 'react-router-dom';
import { buttonClass } from '../components/ui/button';
import { Card } from '../components/ui/card';
import { EmptyState } from '../components/ui/empty-state';
import { PageLoading } from '../components/ui/page-loading';
import { useBookmarks } from '../features/bookmarks/api/bookmarks';
import { BookmarkList } from '../features/bookmarks/components/bookmark-list';

/** The signed-in user's bookmarked records and compounds, with their notes. */
export default function BookmarksPage() {
  const bookmarks = useBookmarks();
  if (bookmarks.isLoading) return <PageLoading label="Loading bookmarks…" />;
  if (bookmarks.error)
    return (
      <p role="alert" className="text-failed">
        {bookmarks.error.message}
      </p>
    );
  const items = bookmarks.data?.items ?? [];
  const records = items.filter((item) => item.recordId !== null);
  const compounds = items.filter((item) => item.compoundId !== null);
  return (
    <section className="space-y-4">
      <header>
        <h1 className="text-2xl font-semibold">Bookmarks</h1>
        <p className="mt-1 text-sm text-ink-soft">
          Records and compounds you marked with ☆, with your own notes. Only you see them.
        </p>
      </header>
      {items.length === 0 ? (
        <EmptyState
          title="No bookmarks yet"
          action={
            <Link to="/search" className={buttonClass('secondary', 'sm')}>
              Go to search
            </Link>
          }
        >
          Press the ☆ beside a record or a compound — in search results, on a record or on a compound page — to keep it
          here.
        </EmptyState>
      ) : (
        <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
          <Card title={`Records (${records.length})`}>
            {records.length ? (
              <BookmarkList bookmarks={records} />
            ) : (
              <p className="text-sm text-ink-soft">No bookmarked records.</p>
            )}
          </Card>
          <Card title={`Compounds (${compounds.length})`}>
            {compounds.length ? (
              <BookmarkList bookmarks={compounds} />
            ) : (
              <p className="text-sm text-ink-soft">No bookmarked compounds.</p>
            )}
          </Card>
        </div>
      )}
    </section>
  );
}
