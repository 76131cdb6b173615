import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import * as encoding from 'lib0/encoding';
import * as Y from 'yjs';
import { io } from 'socket.io-client';
import { DOC_EVENTS, DOC_MESSAGE, DOCUMENT_FIELD, EDITOR_SCHEMA_VERSION, SOCKET_CLOSE_REASONS, SOCKET_EVENTS } from '@upwell/common';
import { DocumentRooms } from '../src/collaboration/document-rooms';
import { DocumentsService } from '../src/documents/documents.service';
import { DocClient, storedDoc, textsOf } from './collab-client';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { eventually } from './socket-client';
import { startTestApp, type TestApp } from './test-app';

/** A sync-update frame carrying `update`, as the reference provider frames it. */
function updateFrame(update: Uint8Array): Uint8Array {
  const e = encoding.createEncoder();
  encoding.writeVarUint(e, DOC_MESSAGE.sync);
  encoding.writeVarUint(e, 2);
  encoding.writeVarUint8Array(e, update);
  return encoding.toUint8Array(e);
}

describe('co-editing a notebook document over socket.io', () => {
  let t: TestApp;
  let lead: TestUser;
  let coauthors: TestUser[];
  let reader: TestUser;
  let outsider: TestUser;
  let groupId: string;
  const open: DocClient[] = [];

  const client = async (who: TestUser | null) => {
    const c = await DocClient.connect(t.url, who ? who.accessToken : null);
    open.push(c);
    return c;
  };
  const notebook = async (title: string) =>
    (await buildNotebook(t.url, groupId, lead, [...coauthors.map((c) => [c, 'co-author'] as [TestUser, 'co-author']), [reader, 'reader']], title)).id;

  beforeAll(async () => {
    t = await startTestApp();
    lead = await buildUser(t.url, 'Lead Author');
    coauthors = [];
    for (let i = 0; i < 9; i++) coauthors.push(await buildUser(t.url, 'Co Author'));
    reader = await buildUser(t.url, 'Reader');
    outsider = await buildUser(t.url, 'Outsider');
    groupId = (await buildGroup(t.url, lead, [...coauthors, reader, outsider])).id;
  });
  afterAll(async () => {
    for (const c of open) c.close();
    await t.close();
  });

  it('acks a join with the role, then syncs the stored document to the joiner', async () => {
    const id = await notebook('Outgassing in the eastern Pacific');
    const c = await client(coauthors[0]);
    const ack = await c.join(id);
    expect(ack).toEqual({ ok: true, role: 'co-author', canEdit: true });
    expect(c.texts()[0]).toBe('Outgassing in the eastern Pacific');
    const r = await client(reader);
    expect(await r.join(id)).toEqual({ ok: true, role: 'reader', canEdit: false });
    expect(r.texts()[0]).toBe('Outgassing in the eastern Pacific');
    // Joining sends the client's own sync step 2, which holds nothing new: nothing is refused, even for a reader.
    await new Promise((res) => setTimeout(res, 100));
    expect(r.refused).toEqual([]);
  });

  it('lets a lead author and a co-author edit at once; both converge and the server stored the same', async () => {
    const id = await notebook('Two authors at once');
    const [a, b] = [await client(lead), await client(coauthors[0])];
    await Promise.all([a.join(id), b.join(id)]);
    const acks: Promise<unknown>[] = [];
    for (let i = 0; i < 10; i++) {
      acks.push(a.addParagraph(`lead ${i}`), b.addParagraph(`co ${i}`));
    }
    expect((await Promise.all(acks)).every((x) => (x as { stored: boolean }).stored)).toBe(true);
    await eventually(() => a.texts().length === 22 && b.texts().length === 22, 5000, 'both clients to hold 22 nodes');
    expect(a.texts()).toEqual(b.texts());
    const stored = await storedDoc(t.url, lead.accessToken, id);
    expect(textsOf(stored)).toEqual(a.texts());
    expect(Y.encodeStateVector(stored)).toEqual(Y.encodeStateVector(a.doc));
  });

  it('ten authors each making several edits concurrently converge with nothing lost or duplicated', async () => {
    const id = await notebook('Ten authors');
    const people = [lead, ...coauthors];
    const clients = await Promise.all(people.map((p) => client(p)));
    await Promise.all(clients.map((c) => c.join(id)));
    const perClient = 6;
    const acks: Promise<{ stored: boolean }>[] = [];
    for (let round = 0; round < perClient; round++) {
      for (const [k, c] of clients.entries()) acks.push(c.addParagraph(`author ${k} edit ${round}`));
      await new Promise((r) => setTimeout(r, 5));
    }
    expect((await Promise.all(acks)).filter((a) => a.stored)).toHaveLength(clients.length * perClient);
    const expected = 2 + clients.length * perClient; // title heading + empty paragraph + the edits
    await eventually(() => clients.every((c) => c.texts().length === expected), 10_000, 'every client to hold every edit');
    const reference = clients[0].texts();
    for (const c of clients) expect(c.texts()).toEqual(reference);
    const edits = reference.filter((s) => s.startsWith('author '));
    expect(new Set(edits).size).toBe(clients.length * perClient);
    expect(edits).toHaveLength(clients.length * perClient);
    expect(textsOf(await storedDoc(t.url, lead.accessToken, id))).toEqual(reference);
  });

  it('refuses a reader’s edit: not applied, not passed on, not stored, and says why', async () => {
    const id = await notebook('A reader tries to write');
    const [author, r] = [await client(coauthors[1]), await client(reader)];
    await Promise.all([author.join(id), r.join(id)]);
    const before = author.received;
    const ack = await r.addParagraph('a reader writes this');
    expect(ack.stored).toBe(false);
    expect(ack.error).toMatch(/reader.*not edit/);
    await eventually(() => r.refused.length === 1, 2000, 'doc:refused');
    expect(r.refused[0]).toEqual({ notebookId: id, reason: ack.error });
    // The author's own next edit arrives at the reader, so anything sent before it would have too.
    await author.addParagraph('an author writes this');
    await eventually(() => r.texts().includes('an author writes this'), 2000, 'the author’s edit at the reader');
    expect(author.received).toBe(before);
    expect(author.texts()).not.toContain('a reader writes this');
    expect(textsOf(await storedDoc(t.url, lead.accessToken, id))).not.toContain('a reader writes this');
  });

  it('refuses joins without a role (same answer as a missing notebook) and from an old editor', async () => {
    const id = await notebook('Not for everyone');
    const o = await client(outsider);
    const none = await o.join(id);
    expect(none).toEqual({ ok: false, error: 'no such notebook, or you have no role on it' });
    expect(await o.join('00000000-0000-4000-8000-000000000000')).toEqual(none);
    expect(await o.join('not-an-id')).toEqual(none);
    expect(o.synced).toBe(false);
    const old = await client(coauthors[0]);
    const ack = await old.join(id, EDITOR_SCHEMA_VERSION - 1);
    expect(ack.ok).toBe(false);
    expect(!ack.ok && ack.error).toMatch(/older .*schema version 0.*reload/);
    expect(old.synced).toBe(false);
    const bad = await old.socket.timeout(2000).emitWithAck(DOC_EVENTS.join, { notebookId: id });
    // Validated with the zod schema in common/src/collab, naming what was wrong.
    expect(bad).toEqual({ ok: false, error: expect.stringMatching(/^doc:join needs \{ notebookId: string, schemaVersion: number \}: schemaVersion: /) });
  });

  it('refuses an unauthenticated socket and sends it nothing of the document', async () => {
    const id = await notebook('Signed in only');
    const socket = io(t.url, { auth: {}, transports: ['websocket'], reconnection: false, forceNew: true });
    const heard: string[] = [];
    socket.onAny((event) => heard.push(event));
    const answers: unknown[] = [];
    socket.on('connect', () => socket.emit(DOC_EVENTS.join, { notebookId: id, schemaVersion: EDITOR_SCHEMA_VERSION }, (a: unknown) => answers.push(a)));
    await new Promise((r) => socket.once('disconnect', r));
    // Either the refusal reached it before the server closed the socket, or the close did; never the document.
    for (const a of answers) expect(a).toEqual({ ok: false, error: SOCKET_CLOSE_REASONS.unauthenticated });
    expect(heard).toContain(SOCKET_EVENTS.error);
    expect(heard).not.toContain(DOC_EVENTS.message);
  });

  it('refuses malformed messages with doc:refused and an ack, and keeps working', async () => {
    const id = await notebook('Garbage in');
    const c = await client(coauthors[2]);
    await c.join(id);
    const cases: [unknown, string | undefined, RegExp][] = [
      ['not binary', id, /needs \{ notebookId: string, data: binary \}/],
      [new Uint8Array([7, 1, 2]), id, /unknown message type 7/],
      [new Uint8Array([DOC_MESSAGE.sync]), id, /could not be read/],
      [updateFrame(new Uint8Array([1, 2, 3, 4, 5, 6, 7, 8])), id, /refused/],
      [updateFrame(new Uint8Array([0, 0])), '00000000-0000-4000-8000-000000000000', /join this notebook/],
      [updateFrame(new Uint8Array([0, 0])), undefined, /needs/],
    ];
    for (const [data, notebookId, why] of cases) {
      const ack = await c.socket.timeout(2000).emitWithAck(DOC_EVENTS.message, { notebookId, data });
      expect(ack.stored).toBe(false);
      expect(ack.error).toMatch(why);
    }
    await eventually(() => c.refused.length === cases.length, 2000, 'a doc:refused per bad message');
    // A node the schema does not know is refused as well.
    const probe = new Y.Doc();
    Y.applyUpdate(probe, Y.encodeStateAsUpdate(c.doc));
    let bad: Uint8Array | null = null;
    probe.on('update', (u: Uint8Array) => (bad = u));
    probe.getXmlFragment(DOCUMENT_FIELD).insert(0, [new Y.XmlElement('script')]);
    const refused = await c.send(updateFrame(bad!));
    expect(refused.error).toMatch(/refused/);
    expect(await c.addParagraph('still working')).toEqual({ stored: true });
    expect(textsOf(await storedDoc(t.url, lead.accessToken, id))).toContain('still working');
  });

  it('relays presence, shows it to late joiners and removes it when a socket goes', async () => {
    const id = await notebook('Who is here');
    const [a, b] = [await client(coauthors[3]), await client(reader)];
    await Promise.all([a.join(id), b.join(id)]);
    // The name others see is the server's record of A, whatever A's client writes (presence-binding.e2e.spec.ts).
    a.awareness.setLocalStateField('user', { name: 'Author A' });
    await eventually(() => b.awareness.getStates().get(a.doc.clientID)?.user?.name === coauthors[3].user.name, 2000, 'A’s presence at B');
    const late = await client(coauthors[4]);
    await late.join(id);
    await eventually(() => late.awareness.getStates().has(a.doc.clientID), 2000, 'A’s presence at a late joiner');
    a.close();
    await eventually(() => !b.awareness.getStates().has(a.doc.clientID), 2000, 'A’s presence gone at B');
  });

  it('loads a room once for simultaneous joins and unloads it after the last socket leaves', async () => {
    const id = await notebook('Load once');
    const rooms = t.app.get(DocumentRooms);
    const before = rooms.unloadAfterMs;
    rooms.unloadAfterMs = 100;
    try {
      const cs = await Promise.all([client(coauthors[5]), client(coauthors[6]), client(coauthors[7])]);
      const loads = vi.spyOn(t.app.get(DocumentsService), 'load');
      await Promise.all(cs.map((c) => c.join(id)));
      expect(loads.mock.calls.filter(([nb]) => nb === id)).toHaveLength(1);
      loads.mockRestore();
      expect(rooms.loaded(id)!.members.size).toBe(3);
      for (const c of cs) c.close();
      await eventually(() => rooms.loaded(id) === undefined, 3000, 'the room to unload');
      // Loaded again from disk, with what was stored.
      const again = await client(coauthors[8]);
      await again.join(id);
      expect(again.texts()[0]).toBe('Load once');
    } finally {
      rooms.unloadAfterMs = before;
    }
  });
});
