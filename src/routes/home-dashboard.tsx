import { Link } from 'react-router-dom';
import { Card } from '../components/ui/card';
import { EmptyState } from '../components/ui/empty-state';
import { PageLoading } from '../components/ui/page-loading';
import { RecordRows } from '../components/record-rows';
import { useBookmarks } from '../features/bookmarks/api/bookmarks';
import { BookmarkList } from '../features/bookmarks/components/bookmark-list';
import { useOverview } from '../features/home/api/overview';
import { GrowthCounts } from '../features/home/components/growth-counts';
import { QuickScout } from '../features/home/components/quick-scout';
import { useRecords } from '../features/records/api/list-records';

const SHOWN = 6;

/** A signed-in member's home: Scout box, counts of the base, what is new in the group and their bookmarks. */
export default function HomeDashboard({ name, firstSignIn }: { name: string; firstSignIn: boolean }) {
  const overview = useOverview();
  const latest = useRecords({ sort: 'createdAt', order: 'desc', page: 1, pageSize: SHOWN });
  const bookmarks = useBookmarks();
  const mine = bookmarks.data?.items ?? [];
  return (
    <section className="space-y-5">
      <header>
        <h1 className="text-2xl font-semibold">
          {firstSignIn ? 'Welcome' : 'Welcome back'}, {name}
        </h1>
        <p className="mt-1 text-sm text-ink-soft">
          What the group has purified lately, what you keep close, and a quick start for a new compound.
        </p>
      </header>
      <Card>
        <QuickScout />
      </Card>
      {overview.data ? (
        <GrowthCounts overview={overview.data} />
      ) : overview.error ? (
        <p role="alert" className="text-failed">
          {overview.error.message}
        </p>
      ) : null}
      <div className="grid grid-cols-1 gap-4 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card
          title="New in the group"
          actions={
            <Link to="/records" className="inline-block min-h-6 py-0.5 text-front hover:underline">
              All records
            </Link>
          }
        >
          {latest.isLoading ? (
            <PageLoading label="Loading records…" />
          ) : latest.data && latest.data.items.length > 0 ? (
            <RecordRows records={latest.data.items} />
          ) : (
            <EmptyState
              title="No records yet"
              action={
                <Link to="/contribute" className="text-front underline">
                  Contribute the first
                </Link>
              }
            >
              The group’s purifications appear here as they are recorded.
            </EmptyState>
          )}
        </Card>
        <Card
          title="My bookmarks"
          actions={
            <Link to="/bookmarks" className="inline-block min-h-6 py-0.5 text-front hover:underline">
              All bookmarks ({mine.length})
            </Link>
          }
        >
          {bookmarks.isLoading ? (
            <PageLoading label="Loading bookmarks…" />
          ) : mine.length > 0 ? (
            <BookmarkList bookmarks={mine.slice(0, 5)} compact />
          ) : (
            <p className="text-sm text-ink-soft">Press ☆ beside a record or compound to keep it here.</p>
          )}
        </Card>
      </div>
    </section>
  );
}
