import { Suspense, type ReactNode } from 'react';
import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppLayout } from './components/app-layout';
import { RouteError } from './components/route-error';
import { RequireRole } from './components/require-role';
import { PageLoading } from './components/ui/page-loading';
import { HomePage } from './routes/home';
import { SignInPage } from './routes/sign-in';
import { NotFoundPage } from './routes/not-found';
import { ComingPage } from './routes/coming';

/** Pages are lazily loaded, so the first load carries only the shell. */
const page = (node: ReactNode) => <Suspense fallback={<PageLoading />}>{node}</Suspense>;

export const router = createBrowserRouter([
  { path: '/sign-in', element: <SignInPage />, errorElement: <RouteError /> },
  {
    element: <AppLayout />,
    errorElement: <RouteError />,
    children: [
      { index: true, element: <HomePage /> },
      { path: 'cautions', element: page(<ComingPage title="Lab cautions" issue={6} />) },
      { path: 'search', element: <RequireRole least="viewer">{page(<ComingPage title="Search" issue={7} />)}</RequireRole> },
      { path: 'records', element: <RequireRole least="viewer">{page(<ComingPage title="Condition records" issue={5} />)}</RequireRole> },
      { path: 'contribute', element: <RequireRole least="member">{page(<ComingPage title="Contribute a record" issue={5} />)}</RequireRole> },
      { path: 'scout', element: <RequireRole least="viewer">{page(<ComingPage title="Scout" issue={6} />)}</RequireRole> },
      { path: 'tools', element: <RequireRole least="viewer">{page(<ComingPage title="Column planner and eluent translator" issue={6} />)}</RequireRole> },
      { path: 'classes', element: <RequireRole least="viewer">{page(<ComingPage title="Compound classes" issue={7} />)}</RequireRole> },
      { path: 'bookmarks', element: <RequireRole least="viewer">{page(<ComingPage title="Bookmarks" issue={7} />)}</RequireRole> },
      { path: 'curation', element: <RequireRole least="curator">{page(<ComingPage title="Curation queue" issue={8} />)}</RequireRole> },
      { path: 'imports', element: <RequireRole least="curator">{page(<ComingPage title="Import" issue={9} />)}</RequireRole> },
      { path: 'admin/users', element: <RequireRole least="admin">{page(<ComingPage title="People and invitations" issue={3} />)}</RequireRole> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
