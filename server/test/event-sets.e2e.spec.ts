import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anomaly, detectEvents, formatMonth, parseMonth, type EventSetView, type FigureResult, type UploadPreview } from '@upwell/common';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { startTestApp, type TestApp } from './test-app';

/** 30 years of a fictional index from 1991-01: a seasonal cycle plus two warm and one cold bump, no noise. */
function indexCsv(): Buffer {
  const bumps: [number, number][] = [[60, 1.6], [130, -1.2], [250, 2.1]];
  const lines = ['date,index'];
  for (let t = 0; t < 360; t++) {
    const v = 26 + Math.cos((2 * Math.PI * t) / 12) + bumps.reduce((s, [p, a]) => s + a * Math.exp(-(((t - p) / 5) ** 2)), 0);
    lines.push(`${formatMonth(parseMonth('1991-01') + t)}-15,${v.toFixed(6)}`);
  }
  return Buffer.from(lines.join('\n') + '\n');
}

describe('event sets of a notebook over HTTP', () => {
  let t: TestApp;
  let lead: TestUser, co: TestUser, reviewer: TestUser, reader: TestUser, member: TestUser, outsider: TestUser;
  let groupId: string;
  let notebookId: string;
  let indexId: string;
  const sets = (nb = notebookId) => `/api/notebooks/${nb}/event-sets`;
  const twoEvents = [
    { phase: 'warm', start: '1995-10', peak: '1996-01', end: '1996-05', label: 'first warm' },
    { phase: 'cold', start: '2001-08', peak: '2001-11', end: '2002-03' },
  ];

  beforeAll(async () => {
    t = await startTestApp();
    [lead, co, reviewer, reader, member, outsider] = await Promise.all(['lead', 'co', 'reviewer', 'reader', 'member', 'outsider'].map((n) => buildUser(t.url, n)));
    groupId = (await buildGroup(t.url, lead, [co, reviewer, reader, member])).id;
    notebookId = (await buildNotebook(t.url, groupId, lead, [[co, 'co-author'], [reviewer, 'reviewer'], [reader, 'reader']])).id;
    const preview = (await request(t.url).post(`/api/groups/${groupId}/uploads`).set(lead.auth).attach('file', indexCsv(), { filename: 'index.csv' }).expect(201)).body as UploadPreview;
    const imp = await request(t.url)
      .post(`/api/uploads/${preview.uploadId}/import`)
      .set(lead.auth)
      .send({ origin: 'observation', columns: [{ column: 'index', skip: false, name: 'Niño-like index', kind: 'climate-index', variable: 'sst', units: 'degC' }] })
      .expect(200);
    indexId = imp.body.series[0].id;
  });
  afterAll(() => t.close());

  it('detect answers the rule’s events on the index anomaly, as detectEvents() finds them, without saving', async () => {
    const res = await request(t.url).post(`${sets()}/detect`).set(reader.auth).send({ index: { seriesId: indexId } }).expect(200);
    const values = (await request(t.url).get(`/api/series/${indexId}/versions/latest/values`).set(lead.auth).expect(200)).body;
    const expected = detectEvents({ index: anomaly({ series: values, base: { from: '1991-01', to: '2020-12' } }).anomaly, threshold: 0.5, minDuration: 5, smooth: 3 }).events;
    expect(res.body.events).toEqual(expected.map((e) => ({ ...e, label: '' })));
    // Built with two warm bumps and one cold one.
    expect(res.body.events.map((e: { phase: string }) => e.phase)).toEqual(['warm', 'cold', 'warm']);
    expect(res.body.index).toMatchObject({ seriesId: indexId, version: 1, name: 'Niño-like index' });
    expect(res.body.methods).toContain("US Climate Prediction Center's ONI");
    expect((await request(t.url).get(sets()).set(lead.auth).expect(200)).body).toEqual([]);
  });

  it('detect honours the rule and the anomaly options: a higher threshold and another base period, as detectEvents() gives', async () => {
    const rule = { from: 'rule', threshold: 1.5, minDuration: 3, smooth: 3 };
    const base = { from: '1991-01', to: '2010-12' };
    const res = await request(t.url).post(`${sets()}/detect`).set(lead.auth).send({ index: { seriesId: indexId }, rule, anomaly: { base } }).expect(200);
    const values = (await request(t.url).get(`/api/series/${indexId}/versions/latest/values`).set(lead.auth).expect(200)).body;
    const expected = detectEvents({ index: anomaly({ series: values, base }).anomaly, threshold: 1.5, minDuration: 3, smooth: 3 }).events;
    expect(res.body.events).toEqual(expected.map((e) => ({ ...e, label: '' })));
    // The 2.1 bump (month 250 = 2011-11) clears 1.5; the −1.2 bump cannot.
    expect(res.body.events.map((e: { peak: string }) => e.peak)).toContain('2011-11');
    expect(res.body.events.every((e: { phase: string }) => e.phase === 'warm')).toBe(true);
    expect(res.body.methods).toContain('1991-01 to 2010-12');
  });

  it('saves, lists, replaces and deletes a set; a saved set shades a figure and an edit changes its cache key', async () => {
    const created = await request(t.url)
      .post(sets())
      .set(co.auth)
      .send({ name: 'Events of the 1990s', derivedFrom: { index: { seriesId: indexId }, rule: { from: 'rule' } }, events: twoEvents })
      .expect(201);
    const set = created.body as EventSetView;
    expect(set).toMatchObject({ notebookId, name: 'Events of the 1990s', events: [{ ...twoEvents[0] }, { ...twoEvents[1], label: '' }] });
    expect(set.derivedFrom).toMatchObject({ index: { seriesId: indexId, version: 'latest' } });
    expect((await request(t.url).get(sets()).set(reader.auth).expect(200)).body.map((s: EventSetView) => s.id)).toEqual([set.id]);

    const recipe = { kind: 'timeseries', series: { seriesId: indexId }, events: { from: 'event-set', eventSetId: set.id } };
    const before = (await request(t.url).post(`/api/notebooks/${notebookId}/figures`).set(reader.auth).send({ recipe }).expect(200)).body as FigureResult;
    expect((before.data.events as { peak: string }[]).map((e) => e.peak)).toEqual(['1996-01', '2001-11']);

    const replaced = await request(t.url).put(`${sets()}/${set.id}`).set(lead.auth).send({ name: 'Only the warm one', events: [twoEvents[0]] }).expect(200);
    expect(replaced.body.events).toHaveLength(1);
    expect(replaced.body.derivedFrom).toBeNull();
    const after = (await request(t.url).post(`/api/notebooks/${notebookId}/figures`).set(reader.auth).send({ recipe }).expect(200)).body as FigureResult;
    expect(after.cached).toBe(false);
    expect(after.cacheKey).not.toBe(before.cacheKey);
    expect(after.data.events).toHaveLength(1);
    expect(after.methods).toContain('"Only the warm one"');

    await request(t.url).delete(`${sets()}/${set.id}`).set(co.auth).expect(204);
    await request(t.url).delete(`${sets()}/${set.id}`).set(co.auth).expect(404);
    await request(t.url).post(`/api/notebooks/${notebookId}/figures`).set(reader.auth).send({ recipe }).expect(404);
  });

  it('refuses overlapping or unsorted events with 400 naming the two events', async () => {
    const overlap = await request(t.url)
      .post(sets())
      .set(lead.auth)
      .send({ name: 'Bad', events: [twoEvents[0], { phase: 'cold', start: '1996-05', peak: '1996-08', end: '1997-01', label: 'too early' }] })
      .expect(400);
    expect(overlap.body.message).toContain('event 1 (warm 1995-10 to 1996-05, “first warm”)');
    expect(overlap.body.message).toContain('event 2 (cold 1996-05 to 1997-01, “too early”)');
    const unsorted = await request(t.url).post(sets()).set(lead.auth).send({ name: 'Bad', events: [twoEvents[1], twoEvents[0]] }).expect(400);
    expect(unsorted.body.message).toContain('sorted');
    const peakOutside = await request(t.url).post(sets()).set(lead.auth).send({ name: 'Bad', events: [{ ...twoEvents[0], peak: '1997-01' }] }).expect(400);
    expect(peakOutside.body.message).toContain('peak');
  });

  it('refuses a provenance index of another group with 404', async () => {
    const foreignGroup = (await buildGroup(t.url, outsider, [], 'Another group')).id;
    const p = (await request(t.url).post(`/api/groups/${foreignGroup}/uploads`).set(outsider.auth).attach('file', indexCsv(), { filename: 'x.csv' }).expect(201)).body as UploadPreview;
    const foreign = (await request(t.url).post(`/api/uploads/${p.uploadId}/import`).set(outsider.auth).send({ columns: [{ column: 'index', skip: false, name: 'x', kind: 'climate-index', variable: 'x', units: '' }] }).expect(200)).body.series[0].id;
    const res = await request(t.url).post(sets()).set(lead.auth).send({ name: 'x', derivedFrom: { index: { seriesId: foreign }, rule: { from: 'rule' } }, events: [] }).expect(404);
    expect(res.body.message).toContain('derivedFrom.index');
    await request(t.url).post(`${sets()}/detect`).set(lead.auth).send({ index: { seriesId: foreign } }).expect(404);
  });

  describe('permission matrix', () => {
    let setId: string;
    beforeAll(async () => {
      setId = (await request(t.url).post(sets()).set(lead.auth).send({ name: 'Matrix', events: twoEvents }).expect(201)).body.id;
    });
    const body = { name: 'Matrix', events: twoEvents };

    it('lead author and co-author may write', async () => {
      for (const who of [lead, co]) {
        const id = (await request(t.url).post(sets()).set(who.auth).send(body).expect(201)).body.id;
        await request(t.url).put(`${sets()}/${id}`).set(who.auth).send(body).expect(200);
        await request(t.url).delete(`${sets()}/${id}`).set(who.auth).expect(204);
      }
    });

    it('reviewer and reader may read and detect but not write (403)', async () => {
      for (const who of [reviewer, reader]) {
        await request(t.url).get(sets()).set(who.auth).expect(200);
        await request(t.url).post(`${sets()}/detect`).set(who.auth).send({ index: { seriesId: indexId } }).expect(200);
        const res = await request(t.url).post(sets()).set(who.auth).send(body).expect(403);
        expect(res.body.message).toContain('edit');
        await request(t.url).put(`${sets()}/${setId}`).set(who.auth).send(body).expect(403);
        await request(t.url).delete(`${sets()}/${setId}`).set(who.auth).expect(403);
      }
    });

    it('a group member without a role and an outsider get 404 on every route', async () => {
      for (const who of [member, outsider]) {
        await request(t.url).get(sets()).set(who.auth).expect(404);
        await request(t.url).post(`${sets()}/detect`).set(who.auth).send({ index: { seriesId: indexId } }).expect(404);
        await request(t.url).post(sets()).set(who.auth).send(body).expect(404);
        await request(t.url).put(`${sets()}/${setId}`).set(who.auth).send(body).expect(404);
        await request(t.url).delete(`${sets()}/${setId}`).set(who.auth).expect(404);
      }
    });

    it('a set of one notebook cannot be changed through another', async () => {
      const other = (await buildNotebook(t.url, groupId, lead, [], 'Other notebook')).id;
      await request(t.url).put(`${sets(other)}/${setId}`).set(lead.auth).send(body).expect(404);
      await request(t.url).delete(`${sets(other)}/${setId}`).set(lead.auth).expect(404);
    });
  });
});
