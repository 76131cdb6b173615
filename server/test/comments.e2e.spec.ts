import request from 'supertest';
import * as Y from 'yjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COMMENT_LIMITS, DOCUMENT_FIELD, SOCKET_EVENTS, type CommentChangedEvent, type CommentThreadList, type CommentThreadView, type NotificationCreatedEvent, type NotificationList } from '@upwell/common';
import type { Socket } from 'socket.io-client';
import { anchorPath } from '../src/comments/anchor-order';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { collect, connectSocket, eventually } from './socket-client';

const b64 = (rel: Y.RelativePosition) => Buffer.from(Y.encodeRelativePosition(rel)).toString('base64');

/** A text anchor around `word` in `text` (the first place it occurs), as the editor helper makes one. */
function anchorAround(text: Y.XmlText, word: string) {
  const at = text.toString().indexOf(word);
  if (at < 0) throw new Error(`"${word}" is not in "${text.toString()}"`);
  // The start sticks to the word's first letter, the end to its last, so typing at either edge stays outside.
  const from = Y.createRelativePositionFromTypeIndex(text, at, 0);
  const to = Y.createRelativePositionFromTypeIndex(text, at + word.length, -1);
  return { type: 'text' as const, from: b64(from), to: b64(to), quote: word };
}

/** The words an anchor covers now, read back from a document. */
function resolvedText(doc: Y.Doc, anchor: { from: string; to: string }): string | null {
  const from = Y.createAbsolutePositionFromRelativePosition(Y.decodeRelativePosition(Buffer.from(anchor.from, 'base64')), doc);
  const to = Y.createAbsolutePositionFromRelativePosition(Y.decodeRelativePosition(Buffer.from(anchor.to, 'base64')), doc);
  if (!from || !to || from.type !== to.type) return null;
  return (from.type as Y.XmlText).toString().slice(from.index, to.index);
}

describe('review threads on a notebook', () => {
  let t: TestApp;
  let lead: TestUser, coauthor: TestUser, reviewer: TestUser, reader: TestUser, outsider: TestUser;
  let notebookId: string;
  let heading: Y.XmlText;
  let sockets: Socket[] = [];

  const comments = (who: TestUser, path = '') => `/api/notebooks/${notebookId}/comments${path}`;
  const post = (who: TestUser, path: string, body?: object) => request(t.url).post(comments(who, path)).set(who.auth).send(body);
  const open = async (who: TestUser, word: string, body: string, mentions: string[] = []) =>
    (await post(who, '', { anchor: anchorAround(heading, word), body, mentions }).expect(201)).body as CommentThreadView;
  const list = async (who: TestUser, status = 'all') => (await request(t.url).get(comments(who)).query({ status }).set(who.auth).expect(200)).body as CommentThreadList;

  beforeAll(async () => {
    t = await startTestApp();
    [lead, coauthor, reviewer, reader, outsider] = await Promise.all([1, 2, 3, 4, 5].map(() => buildUser(t.url)));
    const group = await buildGroup(t.url, lead, [coauthor, reviewer, reader, outsider]);
    notebookId = (await buildNotebook(t.url, group.id, lead, [[coauthor, 'co-author'], [reviewer, 'reviewer'], [reader, 'reader']], 'Outgassing weakened during the warm event')).id;
    const res = await request(t.url).get(`/api/notebooks/${notebookId}/document`).set(reader.auth).expect(200);
    const doc = new Y.Doc();
    Y.applyUpdate(doc, Buffer.from(res.body.state, 'base64'));
    heading = (doc.getXmlFragment(DOCUMENT_FIELD).get(0) as Y.XmlElement).get(0) as Y.XmlText;
  });
  afterAll(async () => {
    sockets.forEach((s) => s.disconnect());
    await t.close();
  });

  it('lets a reader list threads but not open one (403) or reply', async () => {
    const thread = await open(reviewer, 'warm', 'Which index defines the warm event here?');
    await post(reader, '', { anchor: anchorAround(heading, 'event'), body: 'A reader’s note' }).expect(403);
    await post(reader, `/${thread.id}/replies`, { body: 'me too' }).expect(403);
    const seen = await list(reader);
    expect(seen.threads.map((x) => x.body)).toContain('Which index defines the warm event here?');
    expect(seen.threads.find((x) => x.id === thread.id)).toMatchObject({ author: { id: reviewer.user.id }, resolved: null, anchorFound: true, canDelete: false });
  });

  it('refuses people with no role on the notebook as if it did not exist', async () => {
    await request(t.url).get(comments(outsider)).set(outsider.auth).expect(404);
  });

  it('lets a reviewer open a thread and reply, and shows replies in order with their authors', async () => {
    const thread = await open(reviewer, 'Outgassing', 'Outgassing of CO2, or of carbon in general?');
    const r1 = (await post(coauthor, `/${thread.id}/replies`, { body: 'CO2 — I will say so.' }).expect(201)).body;
    await post(reviewer, `/${thread.id}/replies`, { body: 'Thanks.' }).expect(201);
    expect(r1).toMatchObject({ threadId: thread.id, author: { id: coauthor.user.id }, body: 'CO2 — I will say so.', canDelete: true });
    const got = (await list(lead)).threads.find((x) => x.id === thread.id)!;
    expect(got.replies.map((r) => [r.author.id, r.body])).toEqual([
      [coauthor.user.id, 'CO2 — I will say so.'],
      [reviewer.user.id, 'Thanks.'],
    ]);
    expect(got.replies.every((r) => r.canDelete)).toBe(true);
  });

  it('numbers threads in document order, whatever order they were opened in, and lost anchors last', async () => {
    const figure = (await post(reviewer, '', { anchor: { type: 'figure', figureId: 'no-such-figure' }, body: 'Where is this figure?' }).expect(201)).body as CommentThreadView;
    const all = (await list(reader)).threads;
    // "Outgassing" opens the heading; "warm" comes later though its thread was opened first.
    expect(all.map((x) => x.anchor.quote)).toEqual(['Outgassing', 'warm', undefined]);
    expect(all.map((x) => x.number)).toEqual([1, 2, 3]);
    expect(all.at(-1)).toMatchObject({ id: figure.id, anchorFound: false });
  });

  it('records who resolved a thread and when; reopening clears it; the filter follows', async () => {
    const thread = await open(coauthor, 'during', 'Say which months.');
    const before = Date.now();
    const resolved = (await post(reviewer, `/${thread.id}/resolve`).expect(200)).body as CommentThreadView;
    expect(resolved.resolved?.by.id).toBe(reviewer.user.id);
    expect(Date.parse(resolved.resolved!.at)).toBeGreaterThanOrEqual(before - 1000);
    // Resolving again keeps the first record.
    expect((await post(lead, `/${thread.id}/resolve`).expect(200)).body.resolved.by.id).toBe(reviewer.user.id);
    expect((await list(reader, 'resolved')).threads.map((x) => x.id)).toEqual([thread.id]);
    expect((await list(reader, 'open')).threads.map((x) => x.id)).not.toContain(thread.id);
    await post(reader, `/${thread.id}/reopen`).expect(403);
    const reopened = (await post(coauthor, `/${thread.id}/reopen`).expect(200)).body as CommentThreadView;
    expect(reopened.resolved).toBeNull();
    const counts = await list(reader, 'resolved');
    expect([counts.threads.length, counts.resolved]).toEqual([0, 0]);
  });

  it('lets only a comment’s author or the lead author delete it', async () => {
    const thread = await open(reviewer, 'weakened', 'Weakened relative to what?');
    const reply = (await post(coauthor, `/${thread.id}/replies`, { body: 'To the climatology.' }).expect(201)).body;
    await request(t.url).delete(comments(reader, `/${thread.id}/replies/${reply.id}`)).set(reviewer.auth).expect(403);
    await request(t.url).delete(comments(reader, `/${thread.id}`)).set(coauthor.auth).expect(403);
    await request(t.url).delete(comments(reader, `/${thread.id}`)).set(reader.auth).expect(403);
    await request(t.url).delete(comments(reader, `/${thread.id}/replies/${reply.id}`)).set(coauthor.auth).expect(204);
    const second = (await post(reviewer, `/${thread.id}/replies`, { body: 'Fine.' }).expect(201)).body;
    await request(t.url).delete(comments(reader, `/${thread.id}/replies/${second.id}`)).set(lead.auth).expect(204);
    expect((await list(reader)).threads.find((x) => x.id === thread.id)!.replies).toEqual([]);
    await request(t.url).delete(comments(reader, `/${thread.id}`)).set(lead.auth).expect(204);
    expect((await list(reader)).threads.map((x) => x.id)).not.toContain(thread.id);
    const own = await open(reviewer, 'the', 'Mine to take back.');
    await request(t.url).delete(comments(reader, `/${own.id}`)).set(reviewer.auth).expect(204);
  });

  it('notifies a mentioned reader but not a mentioned member without a role, nor the author', async () => {
    const body = `@${reader.user.name} and @${outsider.user.name}: does this match your reading of the warm event?`;
    const thread = await open(reviewer, 'event', body, [reader.user.id, outsider.user.id, reviewer.user.id]);
    const mine = (await request(t.url).get('/api/notifications').set(reader.auth).expect(200)).body as NotificationList;
    expect(mine.unread).toBe(1);
    expect(mine.items[0]).toMatchObject({ type: 'mention', notebookId, threadId: thread.id, by: { id: reviewer.user.id }, read: false });
    expect(mine.items[0]!.excerpt.startsWith(`@${reader.user.name}`)).toBe(true);
    for (const who of [outsider, reviewer]) {
      expect(((await request(t.url).get('/api/notifications').set(who.auth).expect(200)).body as NotificationList).items).toEqual([]);
    }
    // Replies mention too; newest first.
    await post(coauthor, `/${thread.id}/replies`, { body: `@${reader.user.name} see the revised text`, mentions: [reader.user.id] }).expect(201);
    const two = (await request(t.url).get('/api/notifications').set(reader.auth).expect(200)).body as NotificationList;
    expect(two.items.map((n) => n.by.id)).toEqual([coauthor.user.id, reviewer.user.id]);
    expect((await request(t.url).post(`/api/notifications/${two.items[1]!.id}/read`).set(reader.auth).expect(200)).body.read).toBe(true);
    await request(t.url).post(`/api/notifications/${two.items[0]!.id}/read`).set(outsider.auth).expect(404);
    expect(((await request(t.url).get('/api/notifications').set(reader.auth)).body as NotificationList).unread).toBe(1);
    expect(((await request(t.url).post('/api/notifications/read-all').set(reader.auth).expect(200)).body as NotificationList).unread).toBe(0);
  });

  it('pushes changes live to a connected co-author and never to a group member without a role', async () => {
    const co = await connectSocket(t.url, coauthor.accessToken);
    const out = await connectSocket(t.url, outsider.accessToken);
    const rd = await connectSocket(t.url, reader.accessToken);
    sockets.push(co, out, rd);
    const names = [SOCKET_EVENTS.commentThreadCreated, SOCKET_EVENTS.commentReplyAdded, SOCKET_EVENTS.commentThreadResolved, SOCKET_EVENTS.commentThreadReopened, SOCKET_EVENTS.commentReplyDeleted, SOCKET_EVENTS.commentThreadDeleted];
    const coSeen = names.map((n) => collect<CommentChangedEvent>(co, n));
    const outSeen = [...names, SOCKET_EVENTS.notificationCreated].map((n) => collect<unknown>(out, n));
    const readerNotified = collect<NotificationCreatedEvent>(rd, SOCKET_EVENTS.notificationCreated);

    const thread = await open(reviewer, 'Outgassing', `@${reader.user.name} live note`, [reader.user.id, outsider.user.id]);
    const reply = (await post(lead, `/${thread.id}/replies`, { body: 'Seen.' }).expect(201)).body;
    await post(lead, `/${thread.id}/resolve`).expect(200);
    await post(lead, `/${thread.id}/reopen`).expect(200);
    await request(t.url).delete(comments(lead, `/${thread.id}/replies/${reply.id}`)).set(lead.auth).expect(204);
    await request(t.url).delete(comments(lead, `/${thread.id}`)).set(lead.auth).expect(204);

    await eventually(() => coSeen.every((s) => s.length === 1), 3000, 'every change at the co-author');
    expect(coSeen[0]![0]).toEqual({ notebookId, threadId: thread.id, replyId: null, by: reviewer.user.id });
    expect(coSeen[1]![0]).toMatchObject({ threadId: thread.id, replyId: reply.id, by: lead.user.id });
    await eventually(() => readerNotified.length === 1, 3000, 'the reader’s notification');
    expect(readerNotified[0]!.unread).toBeGreaterThanOrEqual(1);
    // Events go out in order on one connection: once the co-author has the last one, the outsider would have had its copy too.
    await new Promise((r) => setTimeout(r, 150));
    expect(out.connected).toBe(true);
    expect(outSeen.flat()).toEqual([]);
  });

  it('refuses an empty body, a huge body and a bad anchor with 400', async () => {
    const anchor = anchorAround(heading, 'warm');
    await post(reviewer, '', { anchor, body: '   ' }).expect(400);
    await post(reviewer, '', { anchor, body: 'x'.repeat(COMMENT_LIMITS.bodyMax + 1) }).expect(400);
    await post(reviewer, '', { body: 'no anchor' }).expect(400);
    await post(reviewer, '', { anchor: { type: 'text', from: 'not base64!', to: anchor.to, quote: 'warm' }, body: 'x' }).expect(400);
    await post(reviewer, '', { anchor: { type: 'text', from: '////', to: '////', quote: 'warm' }, body: 'x' }).expect(400);
    await post(reviewer, '', { anchor: { type: 'text', from: anchor.from, to: anchor.to, quote: '' }, body: 'x' }).expect(400);
    await post(reviewer, '', { anchor: { type: 'paragraph', at: 3 }, body: 'x' }).expect(400);
    await post(reviewer, '', { anchor, body: 'x', mentions: ['not-an-id'] }).expect(400);
    await post(reviewer, '', { anchor, body: '<b>bold</b>', extra: true }).expect(400);
    const thread = await open(reviewer, 'warm', 'fine');
    await post(reviewer, `/${thread.id}/replies`, { body: '' }).expect(400);
    await request(t.url).get(comments(reader)).query({ status: 'pending' }).set(reader.auth).expect(400);
  });

  it('stores markup as the text it is', async () => {
    const thread = await open(reviewer, 'warm', '<img src=x onerror=alert(1)> is <b>not</b> rendered');
    expect((await list(reader)).threads.find((x) => x.id === thread.id)!.body).toBe('<img src=x onerror=alert(1)> is <b>not</b> rendered');
  });
});

describe('text anchors through concurrent edits', () => {
  /** Two replicas of a paragraph, kept apart until `sync` so their edits are concurrent. */
  function replicas(text: string) {
    const a = new Y.Doc();
    const p = new Y.XmlElement('paragraph');
    p.insert(0, [new Y.XmlText(text)]);
    a.getXmlFragment(DOCUMENT_FIELD).insert(0, [p]);
    const b = new Y.Doc();
    Y.applyUpdate(b, Y.encodeStateAsUpdate(a));
    const textIn = (d: Y.Doc) => ((d.getXmlFragment(DOCUMENT_FIELD).get(0) as Y.XmlElement).get(0) as Y.XmlText);
    const sync = () => {
      Y.applyUpdate(a, Y.encodeStateAsUpdate(b, Y.encodeStateVector(a)));
      Y.applyUpdate(b, Y.encodeStateAsUpdate(a, Y.encodeStateVector(b)));
    };
    return { a, b, textIn, sync };
  }

  it('still covers the same word after another replica inserts before it and at its edges', () => {
    const { a, b, textIn, sync } = replicas('Air–sea outgassing weakened in the east.');
    const anchor = anchorAround(textIn(a), 'outgassing');
    textIn(b).insert(0, 'During the 1997 event, ');
    textIn(b).insert(textIn(b).toString().indexOf('outgassing'), 'CO2 ');
    textIn(a).insert(0, 'In short: ');
    textIn(a).insert(textIn(a).toString().indexOf('outgassing') + 'outgassing'.length, ' strongly');
    sync();
    expect(textIn(a).toString()).toBe(textIn(b).toString());
    expect(textIn(a).toString()).toContain('During the 1997 event');
    expect(resolvedText(a, anchor)).toBe('outgassing');
    expect(resolvedText(b, anchor)).toBe('outgassing');
    expect(anchorPath(b, anchor)).toEqual([0, 0, textIn(b).toString().indexOf('outgassing')]);
  });

  it('counts the anchor as lost once its passage is deleted', () => {
    const { a, b, textIn, sync } = replicas('Uptake rose in the west.');
    const anchor = anchorAround(textIn(a), 'rose');
    textIn(b).delete(textIn(b).toString().indexOf('rose'), 'rose '.length);
    sync();
    expect(anchorPath(a, anchor)).toBeNull();
  });
});
