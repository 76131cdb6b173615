import request from 'supertest';
import * as Y from 'yjs';
import { prosemirrorJSONToYDoc } from '@tiptap/y-tiptap';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DOCUMENT_FIELD, upwellSchema, type UploadPreview } from '@upwell/common';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';

describe('GET /api/series/:id/usage', () => {
  let t: TestApp;
  let admin: TestUser;
  let author: TestUser;
  beforeAll(async () => {
    t = await startTestApp();
    [admin, author] = await Promise.all([buildUser(t.url), buildUser(t.url)]);
  });
  afterAll(() => t.close());

  it('names the notebooks whose figures bind a series, and counts those the asker has no role on', async () => {
    const group = await buildGroup(t.url, admin, [author]);
    const csv = 'date,flux\n2000-01,1\n2000-02,2\n2000-03,3\n';
    const preview = (await request(t.url).post(`/api/groups/${group.id}/uploads`).set(author.auth).attach('file', Buffer.from(csv), { filename: 'f.csv' }).expect(201)).body as UploadPreview;
    const imported = await request(t.url)
      .post(`/api/uploads/${preview.uploadId}/import`)
      .set(author.auth)
      .send({ columns: [{ column: 'flux', skip: false, name: 'Flux', kind: 'flux', variable: 'flux', units: 'Pg C/yr' }] })
      .expect(200);
    const seriesId = imported.body.series[0].id as string;
    const nb = await buildNotebook(t.url, group.id, author, [], 'Flux during events');
    await buildNotebook(t.url, group.id, author, [], 'Unrelated notes');

    expect((await request(t.url).get(`/api/series/${seriesId}/usage`).set(author.auth).expect(200)).body).toEqual({ notebooks: [], otherNotebooks: 0 });

    const json = { type: 'doc', content: [{ type: 'liveFigure', attrs: { id: 'f1', caption: '', recipe: { kind: 'seasonal-cycle', series: { seriesId, version: 'latest' } } } }] };
    const update = Y.encodeStateAsUpdate(prosemirrorJSONToYDoc(upwellSchema(), json, DOCUMENT_FIELD));
    await request(t.url).post(`/api/notebooks/${nb.id}/document/updates`).set(author.auth).send({ update: Buffer.from(update).toString('base64') }).expect(200);

    expect((await request(t.url).get(`/api/series/${seriesId}/usage`).set(author.auth).expect(200)).body).toEqual({ notebooks: [{ id: nb.id, title: 'Flux during events' }], otherNotebooks: 0 });
    // The group admin holds no role on the notebook: it is counted, not named.
    expect((await request(t.url).get(`/api/series/${seriesId}/usage`).set(admin.auth).expect(200)).body).toEqual({ notebooks: [], otherNotebooks: 1 });
  });
});
