import request from 'supertest';
import * as encoding from 'lib0/encoding';
import * as syncProtocol from 'y-protocols/sync';
import * as Y from 'yjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DOC_EVENTS, DOC_MESSAGE, SOCKET_CLOSE_REASONS, SOCKET_EVENTS, SOCKET_MESSAGE_LIMIT, type SocketNotice } from '@upwell/common';
import { DocClient, storedDoc, textsOf } from './collab-client';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { collect, connectSocket, eventually } from './socket-client';
import { startTestApp, type TestApp } from './test-app';

/** Sync step 1 with an empty state vector: a cheap message the server answers without storing anything. */
function stepOne(): Uint8Array {
  const e = encoding.createEncoder();
  encoding.writeVarUint(e, DOC_MESSAGE.sync);
  syncProtocol.writeSyncStep1(e, new Y.Doc());
  return encoding.toUint8Array(e);
}

describe('socket messages are rate-limited per person (issue 23 item 7)', () => {
  let t: TestApp;
  let flooder: TestUser, other: TestUser;
  let notebookId: string;

  beforeAll(async () => {
    t = await startTestApp();
    [flooder, other] = await Promise.all([buildUser(t.url, 'Flooder'), buildUser(t.url, 'Other')]);
    const group = await buildGroup(t.url, flooder, [other]);
    notebookId = (await buildNotebook(t.url, group.id, flooder, [[other, 'co-author']], 'Floods')).id;
  });
  afterAll(() => t.close());

  it('refuses 3,000 messages sent at once beyond the allowance, with the stated reason, while serving others', async () => {
    const c = await DocClient.connect(t.url, flooder.accessToken);
    await c.join(notebookId);
    const notices = collect<SocketNotice>(c.socket, SOCKET_EVENTS.error);
    const bystander = await DocClient.connect(t.url, other.accessToken);
    await bystander.join(notebookId);

    const second = await DocClient.connect(t.url, flooder.accessToken);

    const started = Date.now();
    const frame = stepOne();
    const answers = Array.from({ length: 3000 }, () =>
      c.socket.timeout(30_000).emitWithAck(DOC_EVENTS.message, { notebookId, data: frame }) as Promise<{ stored: boolean; error?: string }>,
    );
    // Per person: the flooder's second connection, flooding at the same time, draws on the same allowance.
    const fromSecond = Array.from({ length: 600 }, () =>
      second.socket.timeout(30_000).emitWithAck(DOC_EVENTS.message, { notebookId, data: frame }) as Promise<{ stored: boolean; error?: string }>,
    );
    // While the flood is handled, someone else's edit is stored and the API answers.
    expect(await bystander.addParagraph('typed during the flood')).toEqual({ stored: true });
    await request(t.url).get('/api/health').expect(200);
    const acks = await Promise.all([...answers, ...fromSecond]);
    const seconds = (Date.now() - started) / 1000;
    const refused = acks.filter((a) => a.error === SOCKET_CLOSE_REASONS.rateLimited).length;
    // Token bucket: at most burst + perSecond × elapsed got through, both connections together (one second of slack for timers).
    const allowance = SOCKET_MESSAGE_LIMIT.burst + SOCKET_MESSAGE_LIMIT.perSecond * (seconds + 1);
    expect(3600 - refused).toBeLessThanOrEqual(allowance);
    expect(3600 - refused).toBeGreaterThanOrEqual(SOCKET_MESSAGE_LIMIT.burst);
    second.close();
    expect(notices.map((n) => n.message)).toContain(SOCKET_CLOSE_REASONS.rateLimited);
    expect(c.socket.connected).toBe(true);

    // Once the allowance has refilled the same socket edits again.
    await new Promise((r) => setTimeout(r, 1500));
    expect(await c.addParagraph('after the flood')).toEqual({ stored: true });
    expect(textsOf(await storedDoc(t.url, other.accessToken, notebookId))).toEqual(expect.arrayContaining(['typed during the flood', 'after the flood']));
    c.close();
    bystander.close();
  }, 60_000);
});

describe('sockets end with the session (issue 23 item 3)', () => {
  let t: TestApp;
  let lead: TestUser;
  let notebookId: string;

  beforeAll(async () => {
    t = await startTestApp();
    lead = await buildUser(t.url, 'Lead');
    const group = await buildGroup(t.url, lead);
    notebookId = (await buildNotebook(t.url, group.id, lead, [], 'Signed out')).id;
  });
  afterAll(() => t.close());

  it('closes an open socket at sign out everywhere, saying why; an edit after it is not stored', async () => {
    const c = await DocClient.connect(t.url, lead.accessToken);
    await c.join(notebookId);
    expect(await c.addParagraph('before signing out')).toEqual({ stored: true });
    const ended = collect<SocketNotice>(c.socket, SOCKET_EVENTS.sessionEnded);
    await request(t.url).post('/api/auth/logout').set(lead.auth).expect(204);
    await eventually(() => !c.socket.connected, 2000, 'the socket to be closed');
    expect(ended).toEqual([{ message: SOCKET_CLOSE_REASONS.signedOut }]);
    // The client keeps editing; nothing of it reaches the store.
    const late = c.addParagraph('after signing out');
    expect(await Promise.race([late.catch(() => 'no answer'), new Promise((r) => setTimeout(() => r('no answer'), 500))])).toBe('no answer');
    const fresh = (await request(t.url).post('/api/auth/login').send({ email: lead.user.email, password: lead.password }).expect(200)).body as { accessToken: string };
    const texts = textsOf(await storedDoc(t.url, fresh.accessToken, notebookId));
    expect(texts).toContain('before signing out');
    expect(texts).not.toContain('after signing out');
    // The old token no longer opens a socket.
    await expect(connectSocket(t.url, lead.accessToken).then((s) => new Promise((resolve) => s.once('disconnect', () => resolve('closed'))))).resolves.toBe('closed');
  });
});

describe('sockets end when the token expires (issue 23 item 3)', () => {
  let t: TestApp;
  afterAll(() => t.close());

  it('closes the socket of a two-second token at its expiry, saying why', async () => {
    t = await startTestApp({ JWT_TTL_SECONDS: '2' });
    const lead = await buildUser(t.url, 'Short-lived');
    const group = await buildGroup(t.url, lead);
    const notebookId = (await buildNotebook(t.url, group.id, lead, [], 'Expiring')).id;
    const c = await DocClient.connect(t.url, lead.accessToken);
    const ended = collect<SocketNotice>(c.socket, SOCKET_EVENTS.sessionEnded);
    await c.join(notebookId);
    expect(await c.addParagraph('while signed in')).toEqual({ stored: true });
    await eventually(() => !c.socket.connected, 4000, 'the socket to close at expiry');
    expect(ended).toEqual([{ message: SOCKET_CLOSE_REASONS.expired }]);
  });
});
