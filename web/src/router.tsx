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

/** Every screen of the web client. */
export const routes = [
  { path: '/sign-in', element: <SignInPage /> },
  { path: '/sign-up', element: <SignUpPage /> },
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
