import { Theme } from '@radix-ui/themes';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { InvitationPreview } from '@upwell/common';
import InvitationPage from '.';

const preview: InvitationPreview = {
  kind: 'group',
  groupName: 'Equatorial carbon group',
  notebookTitle: null,
  role: 'member',
  invitedBy: { id: 'u1', name: 'Ines Invitadora', email: 'ines@example.org' },
  email: 'new@example.org',
  expiresAt: '2026-12-08T12:00:00.000Z',
  accountExists: false,
};

/** Answers GET /api/invitations/:token with the given status and JSON body (the server's error shape). */
function serve(status: number, body: unknown) {
  vi.stubGlobal('fetch', vi.fn(async () => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } })));
}

function renderPage() {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const router = createMemoryRouter([{ path: '/invitations/:token', element: <InvitationPage /> }], { initialEntries: ['/invitations/abc'] });
  render(
    <Theme>
      <QueryClientProvider client={qc}>
        <RouterProvider router={router} />
      </QueryClientProvider>
    </Theme>,
  );
}

afterEach(() => vi.unstubAllGlobals());

describe('the invitation accept page', () => {
  it('offers sign-up with name and password when no account uses the invited address', async () => {
    serve(200, preview);
    renderPage();
    expect(await screen.findByRole('heading', { name: 'Invitation to Equatorial carbon group' })).toBeTruthy();
    expect(screen.getByText(/Ines Invitadora invites new@example.org/)).toBeTruthy();
    expect(screen.getByRole('textbox', { name: 'Your name' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Create account and accept' })).toBeTruthy();
  });

  it('offers sign-in with the password alone when the account exists', async () => {
    serve(200, { ...preview, accountExists: true });
    renderPage();
    expect(await screen.findByRole('button', { name: 'Sign in and accept' })).toBeTruthy();
    expect(screen.queryByRole('textbox', { name: 'Your name' })).toBeNull();
  });

  it('explains a used, revoked or expired link (410) with the server’s reason', async () => {
    serve(410, { statusCode: 410, error: 'Gone', message: 'this invitation was revoked by whoever sent it; ask them for a new one' });
    renderPage();
    expect(await screen.findByRole('heading', { name: 'This invitation no longer works' })).toBeTruthy();
    expect(screen.getByText(/revoked by whoever sent it/)).toBeTruthy();
  });

  it('says so when the link is unknown (404)', async () => {
    serve(404, { statusCode: 404, error: 'Not Found', message: 'no such invitation: the link is wrong or incomplete' });
    renderPage();
    expect(await screen.findByRole('heading', { name: 'No such invitation' })).toBeTruthy();
  });
});
