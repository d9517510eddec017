import { lazy, Suspense, type ReactNode } from 'react';
import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppLayout } from './components/app-layout';
import { RouteError } from './components/route-error';
import { RequireRole } from './components/require-role';
import { PageLoading } from './components/ui/page-loading';
import { HomePage } from './routes/home';
import { SignInPage } from './routes/sign-in';
import { NotFoundPage } from './routes/not-found';

const AccountPage = lazy(() => import('./routes/account'));
const AdminUsersPage = lazy(() => import('./routes/admin-users'));
const AdminMailboxPage = lazy(() => import('./routes/admin-mailbox'));
const AcceptInvitationPage = lazy(() => import('./routes/accept-invitation'));
const PasswordResetRequestPage = lazy(() => import('./routes/password-reset-request'));
const PasswordResetPage = lazy(() => import('./routes/password-reset'));
const CurationPage = lazy(() => import('./routes/curation'));
const ImportsPage = lazy(() => import('./routes/imports'));
const CurationMergePage = lazy(() => import('./routes/curation-merge'));
const RecordsPage = lazy(() => import('./routes/records'));
const RecordPage = lazy(() => import('./routes/record'));
const RecordEditPage = lazy(() => import('./routes/record-edit'));
const ContributePage = lazy(() => import('./routes/contribute'));
const CompoundPage = lazy(() => import('./routes/compound'));
const SearchPage = lazy(() => import('./routes/search'));
const BookmarksPage = lazy(() => import('./routes/bookmarks'));
const ClassesPage = lazy(() => import('./routes/classes'));
const ClassPage = lazy(() => import('./routes/class-detail'));
const ScoutPage = lazy(() => import('./routes/scout'));
const ToolsPage = lazy(() => import('./routes/tools'));
const CautionsPage = lazy(() => import('./routes/cautions'));
const ApiReferencePage = lazy(() => import('./routes/api-reference'));

/** Pages are lazily loaded, so the first load carries only the shell. */
const page = (node: ReactNode) => <Suspense fallback={<PageLoading />}>{node}</Suspense>;

const router = createBrowserRouter([
  { path: '/sign-in', element: <SignInPage />, errorElement: <RouteError /> },
  { path: '/invitations/:token', element: page(<AcceptInvitationPage />), errorElement: <RouteError /> },
  { path: '/password-reset', element: page(<PasswordResetRequestPage />), errorElement: <RouteError /> },
  { path: '/password-reset/:token', element: page(<PasswordResetPage />), errorElement: <RouteError /> },
  {
    element: <AppLayout />,
    errorElement: <RouteError />,
    children: [
      { index: true, element: <HomePage /> },
      { path: 'cautions', element: page(<CautionsPage />) },
      { path: 'search', element: <RequireRole least="viewer">{page(<SearchPage />)}</RequireRole> },
      { path: 'records', element: <RequireRole least="viewer">{page(<RecordsPage />)}</RequireRole> },
      { path: 'records/:id', element: <RequireRole least="viewer">{page(<RecordPage />)}</RequireRole> },
      { path: 'records/:id/edit', element: <RequireRole least="member">{page(<RecordEditPage />)}</RequireRole> },
      { path: 'contribute', element: <RequireRole least="member">{page(<ContributePage />)}</RequireRole> },
      { path: 'compounds/:id', element: <RequireRole least="viewer">{page(<CompoundPage />)}</RequireRole> },
      { path: 'scout', element: <RequireRole least="viewer">{page(<ScoutPage />)}</RequireRole> },
      { path: 'tools', element: <RequireRole least="viewer">{page(<ToolsPage />)}</RequireRole> },
      { path: 'classes', element: <RequireRole least="viewer">{page(<ClassesPage />)}</RequireRole> },
      { path: 'classes/:key', element: <RequireRole least="viewer">{page(<ClassPage />)}</RequireRole> },
      { path: 'bookmarks', element: <RequireRole least="viewer">{page(<BookmarksPage />)}</RequireRole> },
      { path: 'curation', element: <RequireRole least="curator">{page(<CurationPage />)}</RequireRole> },
      { path: 'curation/merge', element: <RequireRole least="curator">{page(<CurationMergePage />)}</RequireRole> },
      { path: 'imports', element: <RequireRole least="curator">{page(<ImportsPage />)}</RequireRole> },
      { path: 'account', element: <RequireRole least="viewer">{page(<AccountPage />)}</RequireRole> },
      { path: 'api-reference', element: <RequireRole least="viewer">{page(<ApiReferencePage />)}</RequireRole> },
      { path: 'admin/users', element: <RequireRole least="admin">{page(<AdminUsersPage />)}</RequireRole> },
      { path: 'admin/mailbox', element: <RequireRole least="admin">{page(<AdminMailboxPage />)}</RequireRole> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
