import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { CommentAnchor, CommentThreadList, CommentThreadView, GroupDetail } from '@upwell/common';
import { mockFetch, renderWithQuery } from '../figures/test-render';
import { CommentsPanel } from './CommentsPanel';

afterEach(() => vi.unstubAllGlobals());

const person = (id: string, name: string) => ({ id, name, email: `${id}@example.org` });
const lead = person('u1', 'Lead Person');
const reviewer = person('u2', 'Reviewer One');

function thread(over: Partial<CommentThreadView>): CommentThreadView {
  return {
    id: 't1',
    notebookId: 'nb1',
    number: 1,
    anchor: { type: 'text', from: 'AAAA', to: 'AAAB', quote: 'outgassing weakened' },
    anchorFound: true,
    author: reviewer,
    body: 'Relative to which base period?',
    createdAt: '2026-12-01T10:00:00.000Z',
    resolved: null,
    replies: [],
    canDelete: false,
    ...over,
  };
}

const threads: CommentThreadList = {
  threads: [
    thread({ id: 't1', number: 1, replies: [{ id: 'r1', threadId: 't1', author: lead, body: '1991–2020, as stated in Methods.', createdAt: '2026-12-01T11:00:00.000Z', canDelete: true }] }),
    thread({ id: 't2', number: 2, anchor: { type: 'figure', figureId: 'f1', quote: 'Composite DIC anomaly' }, body: 'Shade the significant months.', resolved: { by: lead, at: '2026-12-02T09:00:00.000Z' } }),
    thread({ id: 't3', number: 3, anchor: { type: 'text', from: 'AAAA', to: 'AAAB', quote: 'in the east' }, body: 'East of which longitude?', author: lead, canDelete: true }),
  ],
  open: 2,
  resolved: 1,
};

const group: GroupDetail = {
  id: 'g1',
  name: 'Carbon group',
  createdAt: '2026-01-01T00:00:00.000Z',
  role: 'member',
  allowed: ['view', 'create-notebook', 'upload-series'],
  members: [
    { user: lead, role: 'admin', since: '2026-01-01T00:00:00.000Z' },
    { user: reviewer, role: 'member', since: '2026-01-01T00:00:00.000Z' },
  ],
};

function setup(props: { canComment: boolean; anchor?: CommentAnchor | null }) {
  const fetch = mockFetch((path) => {
    if (path === '/api/groups/g1') return { json: group };
    if (path.startsWith('/api/notebooks/nb1/comments?')) return { json: threads };
    return { status: 201, json: thread({}) };
  });
  renderWithQuery(<CommentsPanel notebookId="nb1" groupId="g1" {...props} />);
  const sent = () =>
    fetch.mock.calls.filter(([, init]) => init?.method && init.method !== 'GET').map(([url, init]) => ({ url, method: init!.method, body: init!.body ? JSON.parse(String(init!.body)) : undefined }));
  return { fetch, sent };
}

describe('CommentsPanel', () => {
  it('lists open notes by number with passage, author and replies, and resolved ones only when asked', async () => {
    setup({ canComment: true });
    const notes = await screen.findByRole('list', { name: 'Notes' });
    const articles = within(notes).getAllByRole('article');
    expect(articles.map((a) => a.querySelector('.upwell-note-number')!.textContent)).toEqual(['Note 1', 'Note 3']);
    expect(screen.getByRole('article', { name: 'Note 3' })).toBe(articles[1]);
    expect(within(articles[0]!).getByText('outgassing weakened')).toBeTruthy();
    expect(within(articles[0]!).getByText('Reviewer One')).toBeTruthy();
    expect(within(screen.getByRole('list', { name: 'Replies to note 1' })).getByText('1991–2020, as stated in Methods.')).toBeTruthy();
    expect(screen.queryByText('Shade the significant months.')).toBeNull();

    fireEvent.click(screen.getByRole('switch', { name: 'Show resolved notes (1)' }));
    const resolved = screen.getByText('Shade the significant months.').closest('article')!;
    expect(within(resolved).getByText(/Resolved by Lead Person/)).toBeTruthy();
    expect(within(resolved).getByRole('button', { name: 'Reopen' })).toBeTruthy();
    expect(within(resolved).queryByRole('button', { name: 'Resolve' })).toBeNull();
  });

  it('shows a reader the notes but no composer, reply box, resolve or delete', async () => {
    setup({ canComment: false, anchor: { type: 'figure', figureId: 'f1' } });
    await screen.findByText('Relative to which base period?');
    expect(screen.queryByRole('textbox', { name: 'Comment' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Add comment' })).toBeNull();
    expect(screen.queryByRole('textbox', { name: /Reply to note/ })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Resolve' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Reply' })).toBeNull();
  });

  it('sends a reply and a resolve to the API for the right thread', async () => {
    const { sent } = setup({ canComment: true });
    const box = await screen.findByRole('textbox', { name: 'Reply to note 1' });
    fireEvent.change(box, { target: { value: 'Agreed, thanks.' } });
    const note1 = box.closest('article')!;
    fireEvent.click(within(note1).getByRole('button', { name: 'Reply' }));
    await waitFor(() => expect(sent()).toContainEqual({ url: '/api/notebooks/nb1/comments/t1/replies', method: 'POST', body: { body: 'Agreed, thanks.', mentions: [] } }));
    fireEvent.click(within(note1).getByRole('button', { name: 'Resolve' }));
    await waitFor(() => expect(sent()).toContainEqual({ url: '/api/notebooks/nb1/comments/t1/resolve', method: 'POST', body: undefined }));
  });

  it('offers delete only where the server allows it, and deletes that reply', async () => {
    const { sent } = setup({ canComment: true });
    await screen.findByText('East of which longitude?');
    expect(screen.queryByRole('button', { name: 'Delete note 1' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Delete note 3' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Delete reply by Lead Person' }));
    await waitFor(() => expect(sent()).toContainEqual({ url: '/api/notebooks/nb1/comments/t1/replies/r1', method: 'DELETE', body: undefined }));
  });

  it('ties a new note to the current anchor, completes an @-mention from the group and sends its id', async () => {
    const anchor: CommentAnchor = { type: 'text', from: 'AAAA', to: 'AAAB', quote: 'uptake rose' };
    const { sent } = setup({ canComment: true, anchor });
    expect(screen.getByText('uptake rose')).toBeTruthy();
    const box = screen.getByRole('textbox', { name: 'Comment' });
    await screen.findByText('Relative to which base period?');
    fireEvent.change(box, { target: { value: 'Ask @rev', selectionStart: 8 } });
    const option = await screen.findByRole('option', { name: 'Reviewer One' });
    expect(screen.getByRole('listbox', { name: 'People to mention' })).toBeTruthy();
    fireEvent.mouseDown(option);
    expect((box as HTMLTextAreaElement).value).toBe('Ask @Reviewer One ');
    fireEvent.change(box, { target: { value: 'Ask @Reviewer One about the 1997 months' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add comment' }));
    await waitFor(() =>
      expect(sent()).toContainEqual({ url: '/api/notebooks/nb1/comments', method: 'POST', body: { anchor, body: 'Ask @Reviewer One about the 1997 months', mentions: ['u2'] } }),
    );
  });

  it('keeps Add comment disabled until something is selected and written', async () => {
    setup({ canComment: true, anchor: null });
    const button = screen.getByRole('button', { name: 'Add comment' }) as HTMLButtonElement;
    fireEvent.change(screen.getByRole('textbox', { name: 'Comment' }), { target: { value: 'A note' } });
    expect(button.disabled).toBe(true);
    expect(screen.getByText(/Select a passage or a figure/)).toBeTruthy();
  });
});
