import type { CommentThreadList, DemoInfo, GroupDetail, GroupSummary, NotebookRoleView, NotebookView, SeriesPage } from '@upwell/common';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildApp } from '../src/app.factory';
import { DEMO_GROUP_NAME, DEMO_PEOPLE } from '../src/demo/demo-people';
import { computeEveryRecipe } from './demo-helpers';
import { startTestApp } from './test-app';

// The demo as the task (issue 8) describes it: four people with the four notebook roles in one group,
// the demo series uploaded as model output, both example notebooks, release 2 as new versions, and
// open review threads with a reply and an @-mention.

/** The app on a given data folder, so a second start sees the first one's database. */
async function startOn(dataDir: string, seed: 'true' | 'false') {
  const { app } = await buildApp({ DATA_DIR: dataDir, PORT: '0', WEB_DIST: '', AUTH_ATTEMPTS_PER_MINUTE: '10000', SEED_DEMO: seed }, { logger: false });
  await app.listen(0, '127.0.0.1');
  const { port } = app.getHttpServer().address() as { port: number };
  return { app, url: `http://127.0.0.1:${port}` };
}

async function signIn(url: string, email: string, password: string) {
  const res = await request(url).post('/api/auth/login').send({ email, password }).expect(200);
  return { Authorization: `Bearer ${res.body.accessToken}` };
}

/** Counts of everything the seed makes, as the lead author sees them. */
async function census(url: string) {
  const lead = await signIn(url, DEMO_PEOPLE[0].email, DEMO_PEOPLE[0].password);
  const groups = (await request(url).get('/api/groups').set(lead).expect(200)).body as GroupSummary[];
  const demo = groups.filter((g) => g.name === DEMO_GROUP_NAME);
  const series = (await request(url).get(`/api/groups/${demo[0].id}/series?pageSize=50`).set(lead).expect(200)).body as SeriesPage;
  const notebooks = (await request(url).get(`/api/groups/${demo[0].id}/notebooks`).set(lead).expect(200)).body as NotebookView[];
  const fields = (await request(url).get(`/api/groups/${demo[0].id}/fields`).set(lead).expect(200)).body;
  let threads = 0;
  for (const nb of notebooks) threads += ((await request(url).get(`/api/notebooks/${nb.id}/comments`).set(lead).expect(200)).body as CommentThreadList).threads.length;
  return { lead, groups: demo.length, group: demo[0], series, notebooks, zonal: fields.zonal.length, threads };
}

describe('demo seed', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'upwell-demo-seed-'));
  let first: Awaited<ReturnType<typeof startOn>>;
  let seen: Awaited<ReturnType<typeof census>>;

  beforeAll(async () => {
    first = await startOn(dataDir, 'true');
    seen = await census(first.url);
  }, 120_000);
  afterAll(async () => {
    await first?.app.close();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('answers the demo accounts on GET /api/demo, and every one of them can sign in', async () => {
    expect((await request(first.url).get('/api/demo/status').expect(200)).body).toEqual({ enabled: true });
    const info = (await request(first.url).get('/api/demo').expect(200)).body as DemoInfo;
    expect(info.people.map((p) => p.role)).toEqual(['lead-author', 'co-author', 'reviewer', 'reader']);
    for (const p of info.people) {
      expect(p.email).toMatch(/@upwell\.example$/); // RFC 2606 reserves .example
      await signIn(first.url, p.email, p.password);
    }
  });

  it('makes one group of the four people, and gives each their role on both example notebooks', async () => {
    expect(seen.groups).toBe(1);
    const group = (await request(first.url).get(`/api/groups/${seen.group.id}`).set(seen.lead).expect(200)).body as GroupDetail;
    expect(group.members.map((m) => m.user.email).sort()).toEqual(DEMO_PEOPLE.map((p) => p.email).sort());
    expect(seen.notebooks.map((n) => n.title).sort()).toEqual(['Carbon through the strongest warm event of the Lantern hindcast', 'Methods check: base period and autocorrelation']);
    for (const nb of seen.notebooks) {
      const roles = (await request(first.url).get(`/api/notebooks/${nb.id}/roles`).set(seen.lead).expect(200)).body as NotebookRoleView[];
      expect(roles.map((r) => [r.role, r.user.email])).toEqual(DEMO_PEOPLE.map((p) => [p.role, p.email]));
    }
  });

  it('uploads the demo series through the app’s import, with release 2 as a second version of the model output', async () => {
    const byName = Object.fromEntries(seen.series.items.map((s) => [s.name, s]));
    expect(Object.keys(byName).sort()).toEqual([
      'Air–sea CO2 flux 0–100 m', 'Biology 0–100 m', 'DIC inventory 0–100 m', 'DIC inventory full depth', 'DIC tendency 0–100 m',
      'Diffusion 0–100 m', 'Horizontal advection 0–100 m', 'Niño-like SST index (demo)', 'Vertical advection 0–100 m',
    ]);
    // Release 2 revises biology and the air–sea flux from 2010 on (RELEASE_2_CHANGES of the generator); a series
    // whose values did not change keeps one version, since the import stores no duplicate version.
    const revised = seen.series.items.filter((s) => s.latest?.number === 2).map((s) => s.name);
    expect(revised).toEqual(expect.arrayContaining(['Biology 0–100 m', 'Air–sea CO2 flux 0–100 m']));
    expect(byName['Niño-like SST index (demo)'].latest?.number).toBe(1);
    expect(seen.series.items.every((s) => (s.latest?.number ?? 0) <= 2)).toBe(true);
    const detail = (await request(first.url).get(`/api/series/${byName['DIC inventory 0–100 m'].id}`).set(seen.lead).expect(200)).body;
    expect(detail.versions.length).toBeGreaterThanOrEqual(1);
    for (const v of detail.versions as { file: { name: string } | null; createdBy: { email: string } }[]) expect([v.file?.name, v.createdBy.email]).toEqual(['dic-inventory.csv', DEMO_PEOPLE[0].email]);
    const biology = (await request(first.url).get(`/api/series/${byName['Biology 0–100 m'].id}`).set(seen.lead).expect(200)).body;
    expect(biology.versions.map((v: { file: { name: string } | null }) => v.file?.name)).toEqual(['carbon-budget.csv', 'carbon-budget.csv']);
    expect(byName['Biology 0–100 m'].origin).toBe('model-output');
    expect(seen.zonal).toBe(1);
    // Both releases stay on disk for people to upload by hand.
    expect(readdirSync(join(dataDir, 'demo', 'release-2')).sort()).toEqual(expect.arrayContaining(['carbon-budget.csv', 'dic-inventory.csv', 'index.csv', 'surface-dic.nc']));
  });

  it('leaves open review threads by the reviewer and co-author, with a reply that @-mentions the lead author', async () => {
    expect(seen.threads).toBe(3);
    const analysis = seen.notebooks.find((n) => n.title.startsWith('Carbon'))!;
    const list = (await request(first.url).get(`/api/notebooks/${analysis.id}/comments`).set(seen.lead).expect(200)).body as CommentThreadList;
    expect(list.open).toBe(2);
    expect(list.threads.every((t) => t.anchorFound)).toBe(true);
    expect(list.threads.flatMap((t) => t.replies).map((r) => r.body)).toEqual([expect.stringContaining('@Ilse Marrow')]);
    const notes = (await request(first.url).get('/api/notifications').set(seen.lead).expect(200)).body;
    expect(notes.items.map((n: { by: { name: string } }) => n.by.name)).toContain('Tavi Okonjo');
  });

  it('seeds notebooks whose every figure and live number computes, as the reader', async () => {
    const reader = await signIn(first.url, DEMO_PEOPLE[3].email, DEMO_PEOPLE[3].password);
    for (const nb of seen.notebooks) {
      const { numbers } = await computeEveryRecipe(first.url, reader, nb.id);
      for (const n of numbers) expect(n, n.key).toMatchObject({ value: expect.any(Number) });
    }
  });

  it('publishes a snapshot of the event analysis from release 1, so comparing it with the live notebook shows release 2', async () => {
    const analysis = seen.notebooks.find((n) => n.title.startsWith('Carbon'))!;
    const reader = await signIn(first.url, DEMO_PEOPLE[3].email, DEMO_PEOPLE[3].password);
    const { snapshots } = (await request(first.url).get(`/api/notebooks/${analysis.id}/snapshots`).set(reader).expect(200)).body as { snapshots: { id: string; number: number; publishedBy: { email: string } }[] };
    expect(snapshots.map((x) => [x.number, x.publishedBy.email])).toEqual([[1, DEMO_PEOPLE[0].email]]);
    const snapshot = (await request(first.url).get(`/api/snapshots/${snapshots[0].id}`).set(reader).expect(200)).body;
    expect(snapshot.figures.filter((f: { error: string | null }) => f.error !== null)).toEqual([]);
    const flux = seen.series.items.find((x) => x.name === 'Air–sea CO2 flux 0–100 m')!;
    const frozenFluxVersions = snapshot.figures.flatMap((f: { result: { used: { seriesId: string; version: number }[] } | null }) => f.result?.used ?? []).filter((u: { seriesId: string }) => u.seriesId === flux.id).map((u: { version: number }) => u.version);
    expect(new Set(frozenFluxVersions)).toEqual(new Set([1]));
    const compare = (await request(first.url).get(`/api/snapshots/${snapshots[0].id}/compare?with=live`).set(reader).expect(200)).body;
    expect(compare.figures.filter((f: { status: string }) => f.status === 'changed').length).toBeGreaterThan(0);
  });

  it('creates nothing new when the app starts again on the same database', async () => {
    await first.app.close();
    first = await startOn(dataDir, 'true');
    const again = await census(first.url);
    expect({ groups: again.groups, series: again.series.total, versions: again.series.items.map((s) => s.latest?.number), notebooks: again.notebooks.length, zonal: again.zonal, threads: again.threads }).toEqual({
      groups: 1, series: seen.series.total, versions: seen.series.items.map((s) => s.latest?.number), notebooks: 2, zonal: 1, threads: 3,
    });
  });
});

describe('SEED_DEMO=false', () => {
  it('starts empty: no demo people, and GET /api/demo answers 404', async () => {
    const t = await startTestApp({ SEED_DEMO: 'false' });
    try {
      expect((await request(t.url).get('/api/demo').expect(404)).body.message).toContain('without the demo seed');
      expect((await request(t.url).get('/api/demo/status').expect(200)).body).toEqual({ enabled: false });
      await request(t.url).post('/api/auth/login').send({ email: DEMO_PEOPLE[0].email, password: DEMO_PEOPLE[0].password }).expect(401);
    } finally {
      await t.close();
    }
  });
});
