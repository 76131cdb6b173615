import type { NotebookFile, NotebookView } from '@upwell/common';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { computeEveryRecipe, uploadDemoSeries } from './demo-helpers';
import { buildGroup, buildUser, type TestUser } from './factories';
import { startTestApp, type TestApp } from './test-app';

// What is checked here is the format as example-notebooks/README.md specifies it (our own spec), and
// that the example notebooks compute through the engine's real route.
const EXAMPLES = join(__dirname, '..', '..', 'example-notebooks');
const example = (name: string): NotebookFile => JSON.parse(readFileSync(join(EXAMPLES, name), 'utf8'));
const withoutDate = (f: NotebookFile) => ({ ...f, exportedAt: undefined });

describe('notebook files: export and import', () => {
  let t: TestApp;
  let lead: TestUser;
  let reader: TestUser;
  let stranger: TestUser;
  let groupA: string;
  let groupB: string;
  let imported: NotebookView;

  beforeAll(async () => {
    t = await startTestApp();
    lead = await buildUser(t.url, 'Lead');
    reader = await buildUser(t.url, 'Reader');
    stranger = await buildUser(t.url, 'Stranger');
    groupA = (await buildGroup(t.url, lead, [reader], 'Group A')).id;
    groupB = (await buildGroup(t.url, lead, [], 'Group B')).id;
    await uploadDemoSeries(t.url, lead.auth, groupA);
    await uploadDemoSeries(t.url, lead.auth, groupB);
  }, 120_000);
  afterAll(() => t?.close());

  it.each(['event-analysis.upwell.json', 'methods-check.upwell.json'])('imports %s into a group holding the demo series, and every figure and live number computes', async (name) => {
    const res = await request(t.url).post(`/api/groups/${groupA}/notebooks/import`).set(lead.auth).send(example(name)).expect(201);
    const nb = res.body as NotebookView;
    expect(nb).toMatchObject({ groupId: groupA, title: example(name).title, myRole: 'lead-author' });
    const { results, numbers } = await computeEveryRecipe(t.url, lead.auth, nb.id);
    expect(results.length).toBeGreaterThanOrEqual(name.startsWith('event') ? 9 : 5);
    // Every live number's key is one its recipe offers, and each has a value.
    for (const n of numbers) expect(n, `live number ${n.key} of a ${n.kind} recipe`).toMatchObject({ value: expect.any(Number) });
    if (name.startsWith('event')) {
      imported = nb;
      expect(results.map((r) => r.kind)).toEqual(expect.arrayContaining(['timeseries', 'event-table', 'lag-correlation', 'composite', 'budget', 'hovmoller']));
    }
  });

  it('exports a notebook as <slug>.upwell.json, and re-imports it in another group with the same document and bindings', async () => {
    const res = await request(t.url).get(`/api/notebooks/${imported.id}/export`).set(lead.auth).expect(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="carbon-through-the-strongest-warm-event-of[a-z-]*\.upwell\.json"$/);
    const file = JSON.parse(res.text) as NotebookFile;
    expect(file).toMatchObject({ format: 'upwell-notebook', formatVersion: 1, title: imported.title });
    expect(JSON.stringify(file.document)).not.toMatch(/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/);
    expect(file.series.map((s) => s.name).sort()).toEqual(example('event-analysis.upwell.json').series.map((s) => s.name).sort());

    const copy = (await request(t.url).post(`/api/groups/${groupB}/notebooks/import`).set(lead.auth).send(file).expect(201)).body as NotebookView;
    const again = JSON.parse((await request(t.url).get(`/api/notebooks/${copy.id}/export`).set(lead.auth).expect(200)).text) as NotebookFile;
    expect(withoutDate(again)).toEqual(withoutDate(file));
    // The copy's bindings point at group B's own series.
    const { results } = await computeEveryRecipe(t.url, lead.auth, copy.id);
    const groupBSeries = (await request(t.url).get(`/api/groups/${groupB}/series?pageSize=50`).set(lead.auth).expect(200)).body.items.map((s: { id: string }) => s.id);
    const groupBFields = (await request(t.url).get(`/api/groups/${groupB}/fields`).set(lead.auth).expect(200)).body.zonal.map((f: { id: string }) => f.id);
    const used = results.flatMap((r) => r.used.map((u) => u.seriesId));
    expect(used.length).toBeGreaterThan(10);
    for (const id of used) expect([...groupBSeries, ...groupBFields]).toContain(id);
  });

  it('lets a reader export and refuses a person without a role (404)', async () => {
    await request(t.url).put(`/api/notebooks/${imported.id}/roles/${reader.user.id}`).set(lead.auth).send({ role: 'reader' }).expect(200);
    await request(t.url).get(`/api/notebooks/${imported.id}/export`).set(reader.auth).expect(200);
    await request(t.url).get(`/api/notebooks/${imported.id}/export`).set(stranger.auth).expect(404);
  });

  it('refuses an import naming series the group lacks with a 400 that names them, and creates nothing', async () => {
    const groupC = (await buildGroup(t.url, lead, [], 'Group C')).id;
    await uploadDemoSeries(t.url, lead.auth, groupC, (name) => name === 'Niño-like SST index (demo)');
    const res = await request(t.url).post(`/api/groups/${groupC}/notebooks/import`).set(lead.auth).send(example('event-analysis.upwell.json')).expect(400);
    expect(res.body.message).toContain('no series named “DIC inventory 0–100 m” in this group');
    expect(res.body.message).toContain('no zonal-mean field named “Surface DIC, zonal mean 20°S–20°N”');
    expect(res.body.message).not.toContain('Niño-like SST index (demo)');
    expect(res.body.issues.map((i: { path: string }) => i.path)).toContain('series.1.name');
    expect((await request(t.url).get(`/api/groups/${groupC}/notebooks`).set(lead.auth).expect(200)).body).toEqual([]);
  });

  it('refuses malformed files with a 400 saying what is wrong', async () => {
    const good = example('methods-check.upwell.json');
    const post = (body: unknown) => request(t.url).post(`/api/groups/${groupA}/notebooks/import`).set(lead.auth).send(body as object);
    expect((await post({ ...good, format: 'some-other-format' }).expect(400)).body.message).toContain('format must be "upwell-notebook"');
    expect((await post({ ...good, formatVersion: 9 }).expect(400)).body.message).toContain('formatVersion');
    expect((await post({ ...good, document: { type: 'doc', content: [{ type: 'marquee' }] } }).expect(400)).body.message).toContain('editor schema');
    const undeclared = { ...good, series: good.series.filter((s) => s.ref !== 'air-sea-flux') };
    expect((await post(undeclared).expect(400)).body.message).toContain('series ref “air-sea-flux”');
    const badRecipe = JSON.parse(JSON.stringify(good).replace('"maxLag":12', '"maxLag":999'));
    expect((await post(badRecipe).expect(400)).body.message).toContain('recipes Upwell cannot compute');
    const raw = await request(t.url).post(`/api/groups/${groupA}/notebooks/import`).set(lead.auth).set('Content-Type', 'application/json').send('{"format": ').expect(400);
    expect(raw.body.message).toContain('not valid JSON');
    await request(t.url).post(`/api/groups/${groupA}/notebooks/import`).set(stranger.auth).send(good).expect(404);
  });
});
