import { Link } from 'react-router-dom';
import { useMe } from '../features/auth/api/session';
import { PageLoading } from '../components/ui/page-loading';

export function HomePage() {
  const { data, isLoading } = useMe();
  if (isLoading) return <PageLoading />;
  const user = data?.user;
  return (
    <section>
      <h1 className="text-2xl font-semibold">{user ? `Welcome back, ${user.name}` : 'Your group’s purification memory'}</h1>
      <p className="mt-2 max-w-2xl text-ink-soft">
        Record what worked on the plate and the column, find how the group purified similar compounds, and get a first
        eluent to try for a new molecule — with the evidence behind every number.
      </p>
      {!user && (
        <Link to="/sign-in" className="mt-6 inline-block rounded-plate bg-front px-4 py-2 font-medium text-white">
          Sign in
        </Link>
      )}
    </section>
  );
}
