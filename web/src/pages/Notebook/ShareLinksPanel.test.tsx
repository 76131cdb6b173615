import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ShareLinkView, SnapshotSummary } from '@upwell/common';
import { mockFetch, renderWithQuery } from '../../figures/test-render';
import { endOfDayIso, ShareLinksPanel } from './ShareLinksPanel';

const snapshot: SnapshotSummary = {
  id: 's1',
  notebookId: 'nb1',
  number: 1,
  title: 'Draft for co-authors',
  releaseNote: '',
  publishedAt: '2026-12-01T18:40:00Z',
  publishedBy: null,
  engineVersion: '1.0.0',
  editorSchemaVersion: 1,
  figureCount: 1,
  numberCount: 0,
  contentSha256: 'ab'.repeat(32),
};
const link = (over: Partial<ShareLinkView>): ShareLinkView => ({
  id: 'l1',
  snapshotId: 's1',
  createdAt: '2026-12-01T19:00:00Z',
  createdBy: null,
  expiresAt: null,
  revokedAt: null,
  state: 'active',
  tokenHint: 'Zx9q',
  ...over,
});

afterEach(() => vi.unstubAllGlobals());

describe('ShareLinksPanel', () => {
  it('shows a new link once with the warning to copy it, then lists it by its hint; revoking sends DELETE', async () => {
    const token = 'x'.repeat(39) + 'Zx9q';
    let links: ShareLinkView[] = [link({ id: 'old', tokenHint: 'a1b2', state: 'revoked', revokedAt: '2026-12-01T19:30:00Z' })];
    const fetch = mockFetch((path, body) => {
      if (path.endsWith('/share-links') && body !== undefined) {
        const created = link({});
        links = [created, ...links];
        return { status: 201, json: { ...created, token, url: `/shared/${token}` } };
      }
      return { json: { links } };
    });
    renderWithQuery(<ShareLinksPanel snapshot={snapshot} />);
    const table = await screen.findByRole('table', { name: 'Share links of snapshot v1' });
    // A revoked link says so in words and offers no revoke.
    expect(within(table).getByRole('row', { name: /a1b2/ }).textContent).toContain('Revoked');
    expect(screen.queryByRole('button', { name: 'Revoke the link ending a1b2' })).toBeNull();

    fireEvent.submit(screen.getByRole('form', { name: 'Create a share link for v1' }));
    const region = await screen.findByRole('region', { name: 'New share link' });
    expect(region.textContent).toContain('Copy it now, it is shown once.');
    expect((within(region).getByRole('textbox', { name: 'New share link address' }) as HTMLInputElement).value).toBe(`${window.location.origin}/shared/${token}`);
    const post = fetch.mock.calls.find(([, init]) => init?.method === 'POST')!;
    expect(JSON.parse(String(post[1]!.body))).toEqual({ expiresAt: null });

    // Once dismissed, the token is nowhere on the page: only its last four characters remain.
    fireEvent.click(within(region).getByRole('button', { name: 'I have copied it' }));
    await screen.findByRole('row', { name: /Zx9q/ });
    expect(document.body.textContent).not.toContain(token);

    fireEvent.click(screen.getByRole('button', { name: 'Revoke the link ending Zx9q' }));
    await waitFor(() => expect(fetch.mock.calls.some(([url, init]) => init?.method === 'DELETE' && url === '/api/snapshots/s1/share-links/l1')).toBe(true));
  });

  it('turns a chosen expiry day into the end of that day as an ISO-8601 instant (RFC 3339 with Z)', () => {
    const iso = endOfDayIso('2030-01-31');
    expect(iso).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/);
    const local = new Date(iso);
    expect([local.getFullYear(), local.getMonth() + 1, local.getDate(), local.getHours(), local.getMinutes()]).toEqual([2030, 1, 31, 23, 59]);
  });
});
