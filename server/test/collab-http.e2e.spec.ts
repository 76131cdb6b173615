import request from 'supertest';
import * as Y from 'yjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DOCUMENT_FIELD } from '@upwell/common';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { eventually } from './socket-client';
import { DocClient, storedDoc, textsOf } from './collab-client';

describe('an HTTP edit of a document people have open', () => {
  let t: TestApp;
  let lead: TestUser;
  let co: TestUser;
  let notebookId: string;
  beforeAll(async () => {
    t = await startTestApp();
    [lead, co] = await Promise.all([buildUser(t.url), buildUser(t.url)]);
    const group = await buildGroup(t.url, lead, [co]);
    notebookId = (await buildNotebook(t.url, group.id, lead, [[co, 'co-author']], 'Open draft')).id;
  });
  afterAll(() => t.close());

  it('reaches the people editing it live and stays in the stored document', async () => {
    const live = await DocClient.connect(t.url, co.accessToken);
    expect((await live.join(notebookId)).ok).toBe(true);
    await live.addParagraph('typed live');

    // A script appends a paragraph over HTTP, built on the stored state as a tool would.
    const doc = await storedDoc(t.url, lead.accessToken, notebookId);
    let update: Uint8Array | null = null;
    doc.on('update', (u: Uint8Array) => (update = u));
    const p = new Y.XmlElement('paragraph');
    p.insert(0, [new Y.XmlText('sent by a script')]);
    doc.getXmlFragment(DOCUMENT_FIELD).push([p]);
    await request(t.url).post(`/api/notebooks/${notebookId}/document/updates`).set(lead.auth).send({ update: Buffer.from(update!).toString('base64') }).expect(200);

    await eventually(() => live.texts().includes('sent by a script'), 5000, 'the HTTP edit to reach the live client');
    const stored = textsOf(await storedDoc(t.url, lead.accessToken, notebookId));
    expect(stored).toEqual(expect.arrayContaining(['typed live', 'sent by a script']));
    expect(live.texts()).toEqual(stored);
    live.close();
  });
});
