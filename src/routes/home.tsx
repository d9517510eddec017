import { lazy, Suspense } from 'react';
import { Link } from 'react-router-dom';
import { useMe } from '../features/auth/api/session';
import { PageLoading } from '../components/ui/page-loading';

const HomeDashboard = lazy(() => import('./home-dashboard'));

/** The home page: the sign-in invitation for visitors; the group's news, bookmarks, Scout box and counts for members. */
export function HomePage() {
  const { data, isLoading } = useMe();
  if (isLoading) return <PageLoading />;
  const user = data?.user;
  if (user) {
    return (
      <Suspense fallback={<PageLoading />}>
        <HomeDashboard name={user.name} firstSignIn={!!data?.firstSignIn} />
      </Suspense>
    );
  }
  return (
    <section>
      <h1 className="text-2xl font-semibold">Your group’s purification memory</h1>
      <p className="mt-2 max-w-2xl text-ink-soft">
        Record what worked on the plate and the column, find how the group purified similar compounds, and get a first
        eluent to try for a new molecule — with the evidence behind every number.
      </p>
      <Link to="/sign-in" className="mt-6 inline-block rounded-plate bg-front px-4 py-2 font-medium text-white">
        Sign in
      </Link>
      <p className="mt-3 text-sm text-ink-soft">Accounts are by invitation from your group’s admin.</p>
    </section>
  );
}
