import request from 'supertest';
import * as Y from 'yjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DOCUMENT_FIELD } from '@upwell/common';
import { MikroORM } from '@mikro-orm/sqlite';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';

/** The document a client would hold after loading it from the server. */
async function clientDoc(url: string, who: TestUser, notebookId: string): Promise<Y.Doc> {
  const res = await request(url).get(`/api/notebooks/${notebookId}/document`).set(who.auth).expect(200);
  const doc = new Y.Doc();
  Y.applyUpdate(doc, Buffer.from(res.body.state, 'base64'));
  return doc;
}

/** Appends a paragraph as an editor would, returning the Yjs update it produced. */
function typeParagraph(doc: Y.Doc, text: string): Uint8Array {
  let update: Uint8Array | null = null;
  const capture = (u: Uint8Array) => (update = u);
  doc.on('update', capture);
  const p = new Y.XmlElement('paragraph');
  p.insert(0, [new Y.XmlText(text)]);
  const frag = doc.getXmlFragment(DOCUMENT_FIELD);
  frag.insert(frag.length, [p]);
  doc.off('update', capture);
  return update!;
}

/** Appends a live figure with the given attributes, returning the Yjs update it produced. */
function addFigure(doc: Y.Doc, attrs: { id: string; caption: string; recipe: Record<string, unknown> | null }): Uint8Array {
  let update: Uint8Array | null = null;
  const capture = (u: Uint8Array) => (update = u);
  doc.on('update', capture);
  const figure = new Y.XmlElement('liveFigure');
  figure.setAttribute('id', attrs.id);
  figure.setAttribute('caption', attrs.caption);
  // The editor stores the recipe as a JSON value in the attribute (common/src/editor/json-attribute.ts).
  figure.setAttribute('recipe', attrs.recipe as unknown as string);
  const frag = doc.getXmlFragment(DOCUMENT_FIELD);
  frag.insert(frag.length, [figure]);
  doc.off('update', capture);
  return update!;
}

/** Plain text of the document's XML fragment, paragraph by paragraph. */
function textOf(doc: Y.Doc): string[] {
  return doc.getXmlFragment(DOCUMENT_FIELD).toArray().map((n) => (n instanceof Y.XmlElement ? n.toArray().map((t) => t.toString()).join('') : ''));
}

describe('notebook documents as Yjs state over HTTP', () => {
  let t: TestApp;
  let lead: TestUser;
  let coauthor: TestUser;
  let reader: TestUser;
  let notebookId: string;

  beforeAll(async () => {
    t = await startTestApp();
    [lead, coauthor, reader] = await Promise.all([buildUser(t.url), buildUser(t.url), buildUser(t.url)]);
    const group = await buildGroup(t.url, lead, [coauthor, reader]);
    notebookId = (await buildNotebook(t.url, group.id, lead, [[coauthor, 'co-author'], [reader, 'reader']], 'The 1997-type warm event')).id;
  });
  afterAll(() => t.close());

  const send = (who: TestUser, update: Uint8Array | string) =>
    request(t.url).post(`/api/notebooks/${notebookId}/document/updates`).set(who.auth).send({ update: typeof update === 'string' ? update : Buffer.from(update).toString('base64') });

  it('starts a new notebook with its title as the first heading, created once on the server', async () => {
    const doc = await clientDoc(t.url, reader, notebookId);
    const first = doc.getXmlFragment(DOCUMENT_FIELD).get(0) as Y.XmlElement;
    expect(first.nodeName).toBe('heading');
    expect(textOf(doc)[0]).toBe('The 1997-type warm event');
  });

  it('stores a co-author’s edit and serves it to the next reader; refuses a reader’s edit', async () => {
    const doc = await clientDoc(t.url, coauthor, notebookId);
    const update = typeParagraph(doc, 'Outgassing fell by a third during the event.');
    const res = await send(coauthor, update).expect(200);
    expect(res.body.stored).toBe(true);
    expect(textOf(await clientDoc(t.url, reader, notebookId))).toContain('Outgassing fell by a third during the event.');

    const readerDoc = await clientDoc(t.url, reader, notebookId);
    const refused = await send(reader, typeParagraph(readerDoc, 'a reader tries to write')).expect(403);
    expect(refused.body.message).toContain('reader');
    expect(textOf(await clientDoc(t.url, lead, notebookId))).not.toContain('a reader tries to write');
  });

  it('refuses updates that are not base64, not Yjs, or break the document schema, and keeps the document', async () => {
    await send(coauthor, 'not base64 at all!').expect(400);
    const garbage = await send(coauthor, Buffer.from('this is not a yjs update').toString('base64')).expect(400);
    expect(garbage.body.message).toContain('refused');
    const doc = await clientDoc(t.url, coauthor, notebookId);
    let update: Uint8Array | null = null;
    doc.on('update', (u: Uint8Array) => (update = u));
    doc.getXmlFragment(DOCUMENT_FIELD).insert(0, [new Y.XmlElement('script')]);
    const bad = await send(coauthor, update!).expect(400);
    expect(bad.body.message).toContain('refused');
    expect(textOf(await clientDoc(t.url, lead, notebookId))[0]).toBe('The 1997-type warm event');
  });

  it('compacts the update log into the stored state without losing an edit', async () => {
    const doc = await clientDoc(t.url, coauthor, notebookId);
    for (let i = 0; i < 60; i++) await send(coauthor, typeParagraph(doc, `line ${i}`)).expect(200);
    const orm = t.app.get(MikroORM);
    const [{ n }] = await orm.em.fork().getConnection().execute('select count(*) as n from notebook_updates where notebook_id = ?', [notebookId]);
    expect(n).toBeLessThan(50);
    const text = textOf(await clientDoc(t.url, reader, notebookId));
    for (let i = 0; i < 60; i++) expect(text).toContain(`line ${i}`);
    const [{ compacted }] = await orm.em.fork().getConnection().execute('select compacted_through as compacted from notebook_documents where notebook_id = ?', [notebookId]);
    expect(compacted).toBeGreaterThan(0);
  });

  it('duplicates a notebook with its document (lead author only)', async () => {
    await request(t.url).post(`/api/notebooks/${notebookId}/duplicate`).set(coauthor.auth).expect(403);
    const copy = await request(t.url).post(`/api/notebooks/${notebookId}/duplicate`).set(lead.auth).expect(201);
    expect(copy.body.title).toBe('The 1997-type warm event (copy)');
    const text = textOf(await clientDoc(t.url, lead, copy.body.id));
    expect(text).toContain('Outgassing fell by a third during the event.');
  });

  it('checks live figures inside an HTTP edit: a recipe the engine cannot compute or an over-long caption is a 400 naming it, nothing stored', async () => {
    const SERIES = '6f1c2a9e-3b1d-4c55-9a0e-1f2d3c4b5a60';
    const before = textOf(await clientDoc(t.url, reader, notebookId));
    // maxLag 61 is beyond the lag-correlation schema's bound (60).
    const badRecipe = await send(coauthor, addFigure(await clientDoc(t.url, coauthor, notebookId), { id: 'f-bad', caption: '', recipe: { kind: 'lag-correlation', index: { seriesId: SERIES }, series: { seriesId: SERIES }, maxLag: 61 } })).expect(400);
    expect(badRecipe.body.message).toContain('figure 1.recipe.maxLag');
    const longCaption = await send(coauthor, addFigure(await clientDoc(t.url, coauthor, notebookId), { id: 'f-long', caption: 'x'.repeat(2001), recipe: null })).expect(400);
    expect(longCaption.body.issues).toEqual([{ path: 'figure 1.caption', message: 'a caption holds at most 2000 characters (this one 2001)' }]);
    expect(textOf(await clientDoc(t.url, reader, notebookId))).toEqual(before);
    // A figure with settings still to choose, and one with a valid recipe and caption, are stored.
    await send(coauthor, addFigure(await clientDoc(t.url, coauthor, notebookId), { id: 'f-new', caption: 'Lagged correlation.', recipe: null })).expect(200);
    await send(coauthor, addFigure(await clientDoc(t.url, coauthor, notebookId), { id: 'f-ok', caption: 'x'.repeat(2000), recipe: { kind: 'seasonal-cycle', series: { seriesId: SERIES } } })).expect(200);
  });
});
