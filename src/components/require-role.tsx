import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { useMe } from '../features/auth/api/session';
import { roleAtLeast, type Role } from '../../shared/schemas/auth';
import { PageLoading } from './ui/page-loading';

/** Client-side guard for pages; the server checks every request on its own. */
export function RequireRole({ least, children }: { least: Role; children: ReactNode }) {
  const { data, isLoading } = useMe();
  const location = useLocation();
  if (isLoading) return <PageLoading />;
  if (!data?.user)
    return <Navigate to={`/sign-in?next=${encodeURIComponent(location.pathname + location.search)}`} replace />;
  if (!roleAtLeast(data.user.role, least)) {
    return (
      <div role="alert" className="rounded-plate border border-line bg-surface p-6">
        <h1 className="text-lg font-semibold">Not available to your role</h1>
        <p className="mt-2 text-ink-soft">
          This page needs the {least} role or above. Ask an admin of your group if you need it.
        </p>
      </div>
    );
  }
  return <>{children}</>;
}
