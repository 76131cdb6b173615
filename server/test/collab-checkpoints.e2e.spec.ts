import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DocClient, storedDoc, textsOf } from './collab-client';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { eventually } from './socket-client';
import { startTestApp, type TestApp } from './test-app';

describe('named checkpoints of a notebook document', () => {
  let t: TestApp;
  let lead: TestUser;
  let coauthor: TestUser;
  let reader: TestUser;
  let notebookId: string;
  const open: DocClient[] = [];

  beforeAll(async () => {
    t = await startTestApp();
    [lead, coauthor, reader] = [await buildUser(t.url, 'Lead'), await buildUser(t.url, 'Co'), await buildUser(t.url, 'Reader')];
    const group = await buildGroup(t.url, lead, [coauthor, reader]);
    notebookId = (await buildNotebook(t.url, group.id, lead, [[coauthor, 'co-author'], [reader, 'reader']], 'Cold event budget')).id;
  });
  afterAll(async () => {
    for (const c of open) c.close();
    await t.close();
  });
  const path = (suffix = '') => `/api/notebooks/${notebookId}/checkpoints${suffix}`;

  it('creates, lists, and restores a checkpoint for everyone connected, as one stored edit', async () => {
    const [a, b] = [await DocClient.connect(t.url, coauthor.accessToken), await DocClient.connect(t.url, reader.accessToken)];
    open.push(a, b);
    await a.join(notebookId);
    await b.join(notebookId);
    await a.addParagraph('first draft of the uptake estimate');
    const created = await request(t.url).post(path()).set(coauthor.auth).send({ name: '  Draft for review  ' }).expect(201);
    expect(created.body).toMatchObject({ notebookId, name: 'Draft for review', createdBy: { id: coauthor.user.id } });
    const atCheckpoint = a.texts();

    await a.addParagraph('a later paragraph');
    const first = a.doc.getXmlFragment('default');
    a.doc.transact(() => first.delete(0, 1)); // the title heading goes too
    await Promise.all(a.acks);
    await eventually(() => b.texts().includes('a later paragraph') && b.texts().length === atCheckpoint.length, 2000, 'B to see the later edits');
    expect(b.texts()).not.toEqual(atCheckpoint);

    const second = await request(t.url).post(path()).set(lead.auth).send({ name: 'After edits' }).expect(201);
    const list = await request(t.url).get(path()).set(reader.auth).expect(200);
    expect(list.body.map((c: { name: string }) => c.name).sort()).toEqual(['After edits', 'Draft for review']);
    expect(list.body[0]).not.toHaveProperty('state');

    const restored = await request(t.url).post(path(`/${created.body.id}/restore`)).set(coauthor.auth).expect(200);
    expect(restored.body).toMatchObject({ changed: true, checkpoint: { id: created.body.id } });
    await eventually(() => JSON.stringify(b.texts()) === JSON.stringify(atCheckpoint), 2000, 'B to hold the checkpoint’s content');
    await eventually(() => JSON.stringify(a.texts()) === JSON.stringify(atCheckpoint), 2000, 'A to hold the checkpoint’s content');
    expect(textsOf(await storedDoc(t.url, lead.accessToken, notebookId))).toEqual(atCheckpoint);

    // Restoring is itself undone by restoring the later checkpoint.
    await request(t.url).post(path(`/${second.body.id}/restore`)).set(lead.auth).expect(200);
    await eventually(() => b.texts().includes('a later paragraph') && b.texts()[0] !== 'Cold event budget', 2000, 'B back at the later state');
    expect(a.texts()).toEqual(b.texts());
    expect(textsOf(await storedDoc(t.url, lead.accessToken, notebookId))).toEqual(b.texts());
    // Restoring what is already there changes nothing.
    const again = await request(t.url).post(path(`/${second.body.id}/restore`)).set(lead.auth).expect(200);
    expect(again.body.changed).toBe(false);
  });

  it('restores with nobody connected, and lets a later joiner load the restored content', async () => {
    const cp = await request(t.url).post(path()).set(lead.auth).send({ name: 'Quiet restore' }).expect(201);
    const c = await DocClient.connect(t.url, lead.accessToken);
    open.push(c);
    await c.join(notebookId);
    const expected = c.texts();
    await c.addParagraph('written after the quiet checkpoint');
    c.close();
    await request(t.url).post(path(`/${cp.body.id}/restore`)).set(lead.auth).expect(200);
    expect(textsOf(await storedDoc(t.url, reader.accessToken, notebookId))).toEqual(expected);
  });

  it('refuses a reader creating or restoring (403), bad names (400) and unknown checkpoints (404)', async () => {
    const cp = await request(t.url).post(path()).set(lead.auth).send({ name: 'Lead only' }).expect(201);
    const refused = await request(t.url).post(path()).set(reader.auth).send({ name: 'Mine' }).expect(403);
    expect(refused.body.message).toMatch(/reader/);
    await request(t.url).post(path(`/${cp.body.id}/restore`)).set(reader.auth).expect(403);
    const bad = await request(t.url).post(path()).set(lead.auth).send({ name: '   ' }).expect(400);
    expect(JSON.stringify(bad.body)).toMatch(/name must not be empty/);
    await request(t.url).post(path('/00000000-0000-4000-8000-000000000000/restore')).set(lead.auth).expect(404);
    const outsider = await buildUser(t.url);
    await request(t.url).get(path()).set(outsider.auth).expect(404);
  });
});
