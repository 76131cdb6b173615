import { Spinner } from '@radix-ui/themes';
import { lazy, Suspense } from 'react';
import { createBrowserRouter, Navigate } from 'react-router';
import { AppShell } from './components/AppShell';
import AccountPage from './pages/Account';
import GroupPage from './pages/Group';
import NotebooksPage from './pages/Notebooks';
import SeriesPage from './pages/Series';
import SeriesLibraryPage from './pages/SeriesLibrary';
import SignInPage from './pages/SignIn';
import SignUpPage from './pages/SignUp';
// E-mail and invitations.
import InvitationPage from './pages/Invitation';
import MailOutboxPage from './pages/MailOutbox';

// The editor (Tiptap, ProseMirror, Yjs) loads with the first notebook opened, not with the sign-in page.
const NotebookPage = lazy(() => import('./pages/Notebook'));
// Snapshots: the frozen pages (static renderer) and the comparison, each in its own chunk.
const SnapshotPage = lazy(() => import('./pages/Snapshot'));
const SharedSnapshotPage = lazy(() => import('./pages/SharedSnapshot'));
const ComparePage = lazy(() => import('./pages/Compare'));
const lazyPage = (page: React.ReactNode) => <Suspense fallback={<Spinner size="3" />}>{page}</Suspense>;

/** Every screen of the web client. */
export const routes = [
  { path: '/sign-in', element: <SignInPage /> },
  { path: '/sign-up', element: <SignUpPage /> },
  // A share link opens without signing in, outside the app shell's redirect.
  { path: '/shared/:token', element: lazyPage(<SharedSnapshotPage />) },
  { path: '/invitations/:token', element: <InvitationPage /> },
  {
    path: '/',
    element: <AppShell />,
    children: [
      { index: true, element: <Navigate to="/notebooks" replace /> },
      { path: 'notebooks', element: <NotebooksPage /> },
      {
        path: 'notebooks/:notebookId',
        element: (
          <Suspense fallback={<Spinner size="3" />}>
            <NotebookPage />
          </Suspense>
        ),
      },
      { path: 'snapshots/:snapshotId', element: lazyPage(<SnapshotPage />) },
      { path: 'notebooks/:notebookId/compare', element: lazyPage(<ComparePage />) },
      { path: 'series', element: <SeriesLibraryPage /> },
      { path: 'series/:seriesId', element: <SeriesPage /> },
      { path: 'group', element: <GroupPage /> },
      { path: 'account', element: <AccountPage /> },
      { path: 'mail', element: <MailOutboxPage /> },
      { path: '*', element: <Navigate to="/notebooks" replace /> },
    ],
  },
];

export const router = createBrowserRouter(routes);
