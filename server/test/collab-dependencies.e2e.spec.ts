import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import * as syncProtocol from 'y-protocols/sync';
import * as Y from 'yjs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DOC_EVENTS, DOC_MESSAGE, DOCUMENT_FIELD, EDITOR_SCHEMA_VERSION, type DocMessage, type DocRefused, type DocUpdateAck } from '@upwell/common';
import { DocClient, storedDoc, textsOf } from './collab-client';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { collect, connectSocket, eventually } from './socket-client';
import { startTestApp, type TestApp } from './test-app';

/** A sync frame (message type 0) of the given y-protocols step around `payload`. */
function syncFrame(step: number, payload: Uint8Array): Uint8Array {
  const e = encoding.createEncoder();
  encoding.writeVarUint(e, DOC_MESSAGE.sync);
  encoding.writeVarUint(e, step);
  encoding.writeVarUint8Array(e, payload);
  return encoding.toUint8Array(e);
}

/** The sync step and payload of a frame the server sent, or null for presence. */
function readSync(data: Uint8Array): { step: number; payload: Uint8Array } | null {
  const d = decoding.createDecoder(new Uint8Array(data));
  if (decoding.readVarUint(d) !== DOC_MESSAGE.sync) return null;
  return { step: decoding.readVarUint(d), payload: decoding.readVarUint8Array(d) };
}

/** Appends a paragraph to `doc` and returns exactly the Yjs update that edit made. */
function paragraph(doc: Y.Doc, text: string): Uint8Array {
  const before = Y.encodeStateVector(doc);
  const frag = doc.getXmlFragment(DOCUMENT_FIELD);
  const p = new Y.XmlElement('paragraph');
  p.insert(0, [new Y.XmlText(text)]);
  frag.insert(frag.length, [p]);
  return Y.encodeStateAsUpdate(doc, before);
}

/**
 * A raw socket.io client speaking y-protocols by hand, so the test decides
 * which of its own updates the server gets (issue 23 item 9: "an update
 * whose dependency the server never received").
 */
async function rawEditor(url: string, token: string, notebookId: string) {
  const socket = await connectSocket(url, token);
  const frames = collect<DocMessage>(socket, DOC_EVENTS.message);
  const refused = collect<DocRefused>(socket, DOC_EVENTS.refused);
  expect(await socket.timeout(5000).emitWithAck(DOC_EVENTS.join, { notebookId, schemaVersion: EDITOR_SCHEMA_VERSION })).toMatchObject({ ok: true });
  const doc = new Y.Doc();
  await eventually(() => frames.some((f) => readSync(f.data)?.step === syncProtocol.messageYjsSyncStep2), 5000, 'the stored document');
  for (const f of frames.splice(0)) {
    const m = readSync(f.data);
    if (m?.step === syncProtocol.messageYjsSyncStep2) Y.applyUpdate(doc, m.payload);
  }
  const send = (frame: Uint8Array) => socket.timeout(10_000).emitWithAck(DOC_EVENTS.message, { notebookId, data: frame }) as Promise<DocUpdateAck>;
  return { socket, doc, frames, refused, send };
}

describe('an acknowledgement means applied and visible (issue 23 item 9)', () => {
  let t: TestApp;
  let lead: TestUser, coauthor: TestUser;
  let groupId: string;

  beforeAll(async () => {
    t = await startTestApp();
    [lead, coauthor] = await Promise.all([buildUser(t.url, 'Lead'), buildUser(t.url, 'Coauthor')]);
    groupId = (await buildGroup(t.url, lead, [coauthor])).id;
  });
  afterAll(() => t.close());

  it('refuses an update whose dependency the server never received, 60 times over, storing none of it and asking for a resync', async () => {
    const notebookId = (await buildNotebook(t.url, groupId, lead, [[coauthor, 'co-author']], 'Missing a step')).id;
    const raw = await rawEditor(t.url, coauthor.accessToken, notebookId);
    paragraph(raw.doc, 'never sent'); // the dependency, kept back
    const orphan = paragraph(raw.doc, 'builds on the one never sent');
    const acks: DocUpdateAck[] = [];
    for (let i = 0; i < 60; i++) acks.push(await raw.send(syncFrame(syncProtocol.messageYjsUpdate, orphan)));
    expect(new Set(acks.map((a) => JSON.stringify(a)))).toEqual(
      new Set([JSON.stringify({ stored: false, error: acks[0].error, resync: true })]),
    );
    expect(acks[0].error).toMatch(/never received/);
    expect(raw.refused[0]).toMatchObject({ notebookId, resync: true });
    // The server asked for what it lacks with its sync step 1.
    await eventually(() => raw.frames.some((f) => readSync(f.data)?.step === syncProtocol.messageYjsSyncStep1), 2000, 'the server’s sync step 1');
    // Nothing stored: neither paragraph, and the update log did not grow (compare the stored bytes before and after a reload).
    const stored = textsOf(await storedDoc(t.url, lead.accessToken, notebookId));
    expect(stored).not.toContain('builds on the one never sent');
    const observer = await DocClient.connect(t.url, lead.accessToken);
    await observer.join(notebookId);
    expect(observer.texts()).toEqual(stored);
    expect(observer.received).toBe(0);
    observer.close();
    raw.socket.close();
  });

  it('after one refused update the same client’s later edits are refused too until it resyncs, then all are applied and visible', async () => {
    const notebookId = (await buildNotebook(t.url, groupId, lead, [[coauthor, 'co-author']], 'Resync')).id;
    const watcher = await DocClient.connect(t.url, lead.accessToken);
    await watcher.join(notebookId);
    const raw = await rawEditor(t.url, coauthor.accessToken, notebookId);
    paragraph(raw.doc, 'first, lost on the way');
    const second = paragraph(raw.doc, 'second');
    expect(await raw.send(syncFrame(syncProtocol.messageYjsUpdate, second))).toMatchObject({ stored: false, resync: true });
    // The next edit builds on the refused one: refused as well, never acked-but-invisible.
    const third = paragraph(raw.doc, 'third');
    expect(await raw.send(syncFrame(syncProtocol.messageYjsUpdate, third))).toMatchObject({ stored: false, resync: true });
    // Resync as y-protocols does: answer the server's step 1 with a step 2 of everything it lacks.
    await eventually(() => raw.frames.some((f) => readSync(f.data)?.step === syncProtocol.messageYjsSyncStep1), 2000, 'the server’s sync step 1');
    const stepOne = raw.frames.map((f) => readSync(f.data)).find((m) => m?.step === syncProtocol.messageYjsSyncStep1)!;
    expect(await raw.send(syncFrame(syncProtocol.messageYjsSyncStep2, Y.encodeStateAsUpdate(raw.doc, stepOne.payload)))).toEqual({ stored: true });
    // A later edit is acknowledged, and what was acknowledged is visible to others and stored.
    expect(await raw.send(syncFrame(syncProtocol.messageYjsUpdate, paragraph(raw.doc, 'fourth')))).toEqual({ stored: true });
    const expected = ['first, lost on the way', 'second', 'third', 'fourth'];
    await eventually(() => expected.every((s) => watcher.texts().includes(s)), 3000, 'every edit at another client');
    expect(textsOf(await storedDoc(t.url, lead.accessToken, notebookId))).toEqual(watcher.texts());
    expect(watcher.texts().slice(-4)).toEqual(expected);
    watcher.close();
    raw.socket.close();
  });

  it('refuses a step 2 with missing dependencies without asking again (no resync loop), and an HTTP edit with them with a 400', async () => {
    const notebookId = (await buildNotebook(t.url, groupId, lead, [[coauthor, 'co-author']], 'No loop')).id;
    const raw = await rawEditor(t.url, coauthor.accessToken, notebookId);
    paragraph(raw.doc, 'kept back');
    const orphan = paragraph(raw.doc, 'orphan');
    const stepOnesBefore = raw.frames.filter((f) => readSync(f.data)?.step === syncProtocol.messageYjsSyncStep1).length;
    expect(await raw.send(syncFrame(syncProtocol.messageYjsSyncStep2, orphan))).toMatchObject({ stored: false, error: expect.stringMatching(/never received/) });
    await new Promise((r) => setTimeout(r, 200));
    expect(raw.frames.filter((f) => readSync(f.data)?.step === syncProtocol.messageYjsSyncStep1).length).toBe(stepOnesBefore);
    const res = await request(t.url)
      .post(`/api/notebooks/${notebookId}/document/updates`)
      .set(coauthor.auth)
      .send({ update: Buffer.from(orphan).toString('base64') });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/never received/);
    raw.socket.close();
  });
});
