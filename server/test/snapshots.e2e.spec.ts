import { createHash } from 'node:crypto';
import { MikroORM } from '@mikro-orm/sqlite';
import { EventEmitter2 } from '@nestjs/event-emitter';
import request from 'supertest';
import * as Y from 'yjs';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import {
  canonicalJSON,
  formatLiveNumber,
  formatMonth,
  parseMonth,
  type FigureResult,
  type ImportUploadResponse,
  type ShareLinkCreated,
  type SnapshotComparison,
  type SnapshotView,
  type UploadPreview,
} from '@upwell/common';
import { restoreUpdate } from '../src/checkpoints/restore-update';
import { stateFromJson } from '../src/documents/initial-document';
import { SnapshotsService } from '../src/snapshots/snapshots.service';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { startTestApp, type TestApp } from './test-app';

const START = '1985-01';
const N = 480;
/** A fictional monthly flux (model output): seasonal cycle plus a slow oscillation; v2 adds a trend. */
function fluxCsv(trendPerMonth: number): Buffer {
  const lines = ['date,flux'];
  for (let t = 0; t < N; t++) {
    const v = 0.6 + 0.15 * Math.sin((2 * Math.PI * t) / 12) + 0.3 * Math.sin((2 * Math.PI * t) / 47) + trendPerMonth * t;
    lines.push(`${formatMonth(parseMonth(START) + t)}-15,${v.toFixed(6)}`);
  }
  return Buffer.from(lines.join('\n') + '\n');
}
const sha256 = (s: string | Buffer) => createHash('sha256').update(s).digest('hex');
const MISSING_SERIES = '00000000-0000-4000-8000-000000000000';

describe('read-only snapshots', () => {
  let t: TestApp;
  let lead: TestUser, co: TestUser, reader: TestUser, outsider: TestUser;
  let groupId: string, notebookId: string, fluxId: string;
  let first: SnapshotView;
  let firstBody: string;

  const recipe = () => ({ kind: 'timeseries', series: { seriesId: fluxId } });
  const docJson = (lead: string) => ({
    type: 'doc',
    content: [
      { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Outgassing in the warm event' }] },
      {
        type: 'paragraph',
        content: [
          { type: 'text', text: `${lead} the flux trend was ` },
          { type: 'liveNumber', attrs: { recipe: recipe(), key: 'trend.perDecade', precision: 3, figureId: 'fig-flux' } },
          { type: 'text', text: ' over the record.' },
        ],
      },
      { type: 'liveFigure', attrs: { id: 'fig-flux', recipe: recipe(), caption: 'Outgassing anomaly with warm and cold events.' } },
      { type: 'liveFigure', attrs: { id: 'fig-broken', recipe: { kind: 'seasonal-cycle', series: { seriesId: MISSING_SERIES } }, caption: 'A figure whose series is gone.' } },
      { type: 'paragraph', content: [{ type: 'text', text: '<script>alert(1)</script> and <img src=x onerror="alert(2)">' }] },
      {
        type: 'paragraph',
        content: [{ type: 'text', text: 'a dangerous link', marks: [{ type: 'link', attrs: { href: 'javascript:alert(3)' } }] }],
      },
    ],
  });

  /** Makes the live document equal to `json`, as one ordinary edit over HTTP. */
  async function setDocument(json: Record<string, unknown>) {
    const res = await request(t.url).get(`/api/notebooks/${notebookId}/document`).set(lead.auth).expect(200);
    const live = new Y.Doc();
    Y.applyUpdate(live, Buffer.from(res.body.state, 'base64'));
    const update = restoreUpdate(live, stateFromJson(json));
    if (update) await request(t.url).post(`/api/notebooks/${notebookId}/document/updates`).set(lead.auth).send({ update: Buffer.from(update).toString('base64') }).expect(200);
  }
  const upload = async (body: Buffer, name: string) =>
    (await request(t.url).post(`/api/groups/${groupId}/uploads`).set(lead.auth).attach('file', body, { filename: name }).expect(201)).body as UploadPreview;
  const importFlux = async (uploadId: string, targets?: Record<string, string>) =>
    (
      await request(t.url)
        .post(`/api/uploads/${uploadId}/import`)
        .set(lead.auth)
        .send({ origin: 'model-output', columns: [{ column: 'flux', skip: false, name: 'Outgassing', kind: 'flux', variable: 'flux', units: 'Pg C/yr' }], ...(targets ? { targets } : {}) })
        .expect(200)
    ).body as ImportUploadResponse;
  const publish = (who: TestUser, title = 'First release', releaseNote = 'As submitted.') =>
    request(t.url).post(`/api/notebooks/${notebookId}/snapshots`).set(who.auth).send({ title, releaseNote });
  const countRows = async (table: string) => {
    const [{ n }] = await t.app.get(MikroORM).em.fork().getConnection().execute(`select count(*) as n from ${table}`);
    return Number(n);
  };

  beforeAll(async () => {
    t = await startTestApp();
    [lead, co, reader, outsider] = await Promise.all(['lead', 'co', 'reader', 'outsider'].map((n) => buildUser(t.url, n)));
    groupId = (await buildGroup(t.url, lead, [co, reader])).id;
    notebookId = (await buildNotebook(t.url, groupId, lead, [[co, 'co-author'], [reader, 'reader']], 'Warm event: outgassing')).id;
    fluxId = (await importFlux((await upload(fluxCsv(0), 'flux.csv')).uploadId)).series[0].id;
    await setDocument(docJson('In the first release'));
  });
  afterAll(() => t.close());

  describe('publishing', () => {
    it('only the lead author may publish: co-author and reader 403, no role 404, and nothing is stored for them', async () => {
      expect((await publish(co).expect(403)).body.message).toContain('lead author only');
      await publish(reader).expect(403);
      await publish(outsider).expect(404);
      await publish(lead).send({ title: '' }).expect(400);
      expect(await countRows('notebook_snapshots')).toBe(0);
    });

    it('freezes document, figures and numbers, pins "latest" to the version used, and emits snapshot.published', async () => {
      const events: unknown[] = [];
      t.app.get(EventEmitter2).on('snapshot.published', (e: unknown) => events.push(e));
      const res = await publish(lead).expect(201);
      firstBody = res.text;
      first = res.body as SnapshotView;
      expect(first).toMatchObject({ number: 1, title: 'First release', releaseNote: 'As submitted.', notebookTitle: 'Warm event: outgassing', figureCount: 2, numberCount: 1 });
      expect(first.publishedBy?.id).toBe(lead.user.id);
      expect(events).toEqual([{ snapshotId: first.id, notebookId, number: 1, title: 'First release', publishedById: lead.user.id }]);

      const [fig, broken] = first.figures;
      expect(fig).toMatchObject({ figureId: 'fig-flux', ordinal: 1, caption: 'Outgassing anomaly with warm and cold events.', error: null });
      expect((fig.recipe as { series: { version: unknown } }).series.version).toBe(1);
      expect(fig.result!.used.map((u) => [u.name, u.version, u.origin])).toEqual([['Outgassing', 1, 'model-output']]);
      // A failing figure does not stop publishing: it is frozen with its error.
      expect(broken).toMatchObject({ figureId: 'fig-broken', ordinal: 2, result: null });
      expect(broken.error).toContain('no series');

      // The frozen number is the figure's value, printed as the editor's live number prints it.
      const trend = fig.result!.numbers.find((n) => n.key === 'trend.perDecade')!;
      expect(first.numbers).toEqual([
        { ordinal: 1, recipe: fig.recipe, key: 'trend.perDecade', precision: 3, figureId: 'fig-flux', value: trend.value, units: trend.units, text: formatLiveNumber(trend.value, 3, trend.units).text, error: null },
      ]);

      // contentSha256 is the sha256 of the canonical JSON of the frozen content (FIPS 180-4 via node:crypto).
      const { document, figures, numbers, notebookTitle, groupId: gid, groupName } = first;
      expect(first.contentSha256).toBe(sha256(canonicalJSON({ document, figures, groupId: gid, groupName, notebookTitle, numbers })));
    });

    it('numbers snapshots 1, 2, … per notebook and lists them newest first for every role', async () => {
      const second = (await publish(lead, 'Second release', '').expect(201)).body as SnapshotView;
      expect(second.number).toBe(2);
      const list = (await request(t.url).get(`/api/notebooks/${notebookId}/snapshots`).set(reader.auth).expect(200)).body;
      expect(list.snapshots.map((s: { number: number }) => s.number)).toEqual([2, 1]);
      expect(list.snapshots[1]).toMatchObject({ id: first.id, contentSha256: first.contentSha256, figureCount: 2 });
      expect(list.snapshots[1].document).toBeUndefined();
      await request(t.url).get(`/api/notebooks/${notebookId}/snapshots`).set(outsider.auth).expect(404);
    });

    it('is one transaction: a storage failure before commit leaves no snapshot and no share link, and the number is not used up', async () => {
      const before = await countRows('notebook_snapshots');
      const service = t.app.get(SnapshotsService);
      const spy = vi.spyOn(service, 'verifyStored').mockRejectedValueOnce(new Error('disk gave out'));
      await publish(lead, 'Doomed').expect(500);
      spy.mockRestore();
      expect(await countRows('notebook_snapshots')).toBe(before);
      expect(await countRows("notebook_snapshots where title = 'Doomed'")).toBe(0);
      expect(await countRows('snapshot_share_links')).toBe(0);
      const next = (await publish(lead, 'Third release').expect(201)).body as SnapshotView;
      expect(next.number).toBe(before + 1);
    });
  });

  describe('reading', () => {
    it('a reader opens it; someone without a role gets 404', async () => {
      const res = await request(t.url).get(`/api/snapshots/${first.id}`).set(reader.auth).expect(200);
      expect(res.text).toBe(firstBody);
      await request(t.url).get(`/api/snapshots/${first.id}`).set(outsider.auth).expect(404);
      await request(t.url).get(`/api/snapshots/not-an-id`).set(reader.auth).expect(400);
      // Signed out, only share links open snapshots.
      await request(t.url).get(`/api/snapshots/${first.id}`).expect(401);
      await request(t.url).get(`/api/snapshots/${first.id}/html`).expect(401);
      await request(t.url).get(`/api/notebooks/${notebookId}/snapshots`).expect(401);
    });

    it('nobody can edit a snapshot: there is no route that changes one', async () => {
      for (const method of ['put', 'patch', 'delete'] as const) {
        await request(t.url)[method](`/api/snapshots/${first.id}`).set(lead.auth).send({ title: 'changed' }).expect(404);
      }
      expect((await request(t.url).get(`/api/snapshots/${first.id}`).set(lead.auth).expect(200)).text).toBe(firstBody);
    });
  });

  describe('HTML file', () => {
    let html: string;
    beforeAll(async () => {
      const res = await request(t.url).get(`/api/snapshots/${first.id}/html`).set(reader.auth).buffer(true).expect(200);
      expect(res.headers['content-type']).toMatch(/^text\/html/);
      expect(res.headers['content-disposition']).toBe('attachment; filename="warm-event-outgassing-v1.html"');
      html = res.text;
    });

    it('has no script, no event-handler attribute and no javascript: URL; the hostile text is inert', () => {
      // The frozen document really holds the hostile content the file must defuse.
      expect(JSON.stringify(first.document)).toContain('javascript:alert(3)');
      expect(JSON.stringify(first.document)).toContain('<script>alert(1)</script>');
      expect(html).not.toMatch(/<script/i);
      expect(html).not.toMatch(/<[^>]+\son[a-z]+\s*=/i);
      expect(html).not.toMatch(/javascript:/i);
      expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
      expect(html).toContain('a dangerous link');
    });

    it('carries the strict CSP and refers to nothing outside itself (fonts and figures are data: URIs)', () => {
      expect(html).toContain(`<meta http-equiv="Content-Security-Policy" content="default-src 'none'; img-src data:; style-src 'unsafe-inline'; font-src data:">`);
      expect(html).not.toMatch(/https?:\/\//);
      const srcs = [...html.matchAll(/\ssrc="([^"]*)"/g)].map((m) => m[1]);
      expect(srcs.length).toBe(1); // the one chart; the broken figure has none
      for (const src of srcs) expect(src).toMatch(/^data:image\/svg\+xml;base64,/);
      const svg = Buffer.from(srcs[0].slice('data:image/svg+xml;base64,'.length), 'base64').toString('utf8');
      expect(svg).toMatch(/^<svg/);
      expect(svg).not.toMatch(/<script/i);
      const urls = [...html.matchAll(/url\(([^)]*)\)/g)].map((m) => m[1]);
      expect(urls.length).toBe(6); // Merriweather 400/400 italic/700, Source Sans 3 400/600, IBM Plex Mono 400
      for (const u of urls) expect(u).toMatch(/^data:font\/woff2;base64,/);
    });

    it('shows the header, the figure with its caption, methods and provenance, the frozen number and the model-output note', () => {
      expect(html).toContain('Snapshot 1: First release');
      expect(html).toContain('As submitted.');
      expect(html).toContain(lead.user.name);
      expect(html).toContain('<strong>Figure 1.</strong> Outgassing anomaly with warm and cold events.');
      expect(html).toContain(first.figures[0].result!.methods.replace(/&/g, '&amp;').replace(/'/g, '&#39;').slice(0, 40));
      expect(html).toContain(`Outgassing v1, sha256 ${first.figures[0].result!.used[0].valuesSha256.slice(0, 12)}`);
      expect(html).toContain(`<span class="live-number">${first.numbers[0].text}</span>`);
      expect(html).toContain('Model output is model output, not observation.');
      expect(html).toContain('frozen as they were computed at publication');
      expect(html).toContain('could not be computed when the snapshot was published');
    });
  });

  describe('share links', () => {
    let link: ShareLinkCreated;
    it('only the lead author creates them; the token is 32 random bytes as 43 base64url characters', async () => {
      await request(t.url).post(`/api/snapshots/${first.id}/share-links`).set(co.auth).send({}).expect(403);
      await request(t.url).post(`/api/snapshots/${first.id}/share-links`).set(outsider.auth).send({}).expect(404);
      await request(t.url).post(`/api/snapshots/${first.id}/share-links`).set(lead.auth).send({ expiresAt: '2001-01-01T00:00:00Z' }).expect(400);
      link = (await request(t.url).post(`/api/snapshots/${first.id}/share-links`).set(lead.auth).send({}).expect(201)).body;
      const other = (await request(t.url).post(`/api/snapshots/${first.id}/share-links`).set(lead.auth).send({ expiresAt: null }).expect(201)).body as ShareLinkCreated;
      // 256 bits from a CSPRNG, as RFC 4086 and OWASP's session-id guidance ask for at least 128 (from memory).
      for (const l of [link, other]) {
        expect(l.token).toMatch(/^[A-Za-z0-9_-]{43,}$/);
        expect(Buffer.from(l.token, 'base64url').length).toBe(32);
        expect(l.url).toBe(`/shared/${l.token}`);
        expect(l.tokenHint).toBe(l.token.slice(-4));
        expect(l.state).toBe('active');
      }
      expect(other.token).not.toBe(link.token);
      // Only the hash is stored.
      const rows = await t.app.get(MikroORM).em.fork().getConnection().execute('select token_sha256 from snapshot_share_links');
      expect(rows.map((r: { token_sha256: string }) => r.token_sha256)).toContain(sha256(link.token));
      expect(JSON.stringify(rows)).not.toContain(link.token);
    });

    it('opens the snapshot and its file without signing in, with the same bytes', async () => {
      expect((await request(t.url).get(`/api/shared/${link.token}`).expect(200)).text).toBe(firstBody);
      const file = await request(t.url).get(`/api/shared/${link.token}/html`).buffer(true).expect(200);
      expect(file.text).toContain('Snapshot 1: First release');
      await request(t.url).get(`/api/shared/${'A'.repeat(43)}`).expect(404);
      await request(t.url).get(`/api/shared/nonsense/html`).expect(404);
    });

    it('a revoked link answers 410 and stays listed as revoked; an expired one answers 410', async () => {
      await request(t.url).delete(`/api/snapshots/${first.id}/share-links/${link.id}`).set(co.auth).expect(403);
      await request(t.url).delete(`/api/snapshots/${first.id}/share-links/${link.id}`).set(lead.auth).expect(204);
      await request(t.url).get(`/api/shared/${link.token}`).expect(410);
      await request(t.url).get(`/api/shared/${link.token}/html`).expect(410);

      const soon = (await request(t.url).post(`/api/snapshots/${first.id}/share-links`).set(lead.auth).send({ expiresAt: new Date(Date.now() + 3_600_000).toISOString() }).expect(201)).body as ShareLinkCreated;
      await request(t.url).get(`/api/shared/${soon.token}`).expect(200);
      await t.app.get(MikroORM).em.fork().getConnection().execute('update snapshot_share_links set expires_at = ? where id = ?', [Date.now() - 1000, soon.id]);
      await request(t.url).get(`/api/shared/${soon.token}`).expect(410);

      const list = (await request(t.url).get(`/api/snapshots/${first.id}/share-links`).set(lead.auth).expect(200)).body.links as { id: string; state: string; revokedAt: string | null }[];
      expect(list.find((l) => l.id === link.id)).toMatchObject({ state: 'revoked', revokedAt: expect.any(String) });
      expect(list.find((l) => l.id === soon.id)?.state).toBe('expired');
      expect(JSON.stringify(list)).not.toContain(link.token);
      await request(t.url).get(`/api/snapshots/${first.id}/share-links`).set(reader.auth).expect(403);
    });
  });

  describe('after the series gets a new version', () => {
    let live: FigureResult;
    beforeAll(async () => {
      const imp = await importFlux((await upload(fluxCsv(0.0005), 'flux-release-2.csv')).uploadId, { flux: fluxId });
      expect(imp.series[0]).toMatchObject({ id: fluxId, version: 2 });
      live = (await request(t.url).post(`/api/notebooks/${notebookId}/figures`).set(lead.auth).send({ recipe: recipe() }).expect(200)).body;
    });

    it('the snapshot is byte-for-byte the same while the live figure shows the new values', async () => {
      const again = await request(t.url).get(`/api/snapshots/${first.id}`).set(lead.auth).expect(200);
      expect(again.text).toBe(firstBody);
      expect(sha256(again.text)).toBe(sha256(firstBody));
      expect(live.used[0].version).toBe(2);
      const liveTrend = live.numbers.find((n) => n.key === 'trend.perDecade')!.value;
      expect(liveTrend).not.toBe(first.numbers[0].value);
    });

    it('compare with=live shows inserted and deleted words and the changed figure value', async () => {
      await setDocument(docJson('In the revised draft'));
      const cmp = (await request(t.url).get(`/api/snapshots/${first.id}/compare?with=live`).set(reader.auth).expect(200)).body as SnapshotComparison;
      expect(cmp.from).toMatchObject({ kind: 'snapshot', id: first.id, number: 1 });
      expect(cmp.to.kind).toBe('live');
      // Word-level runs (jsdiff's diffWordsWithSpace): the changed words, each on its side.
      expect(cmp.text.filter((p) => p.op === 'delete').map((p) => p.text.trim())).toEqual(expect.arrayContaining(['first', 'release']));
      expect(cmp.text.filter((p) => p.op === 'insert').map((p) => p.text.trim())).toEqual(expect.arrayContaining(['revised', 'draft']));
      expect(cmp.text.filter((p) => p.op !== 'equal').map((p) => p.text.trim())).not.toContain('flux');
      // The texts on each side are rebuilt from the runs: equal + delete = before, equal + insert = after.
      const side = (skip: string) => cmp.text.filter((p) => p.op !== skip).map((p) => p.text).join('');
      expect(side('insert')).toContain('In the first release the flux trend was ');
      expect(side('delete')).toContain('In the revised draft the flux trend was ');
      const fig = cmp.figures.find((f) => f.figureId === 'fig-flux')!;
      expect(fig).toMatchObject({ status: 'changed', recipeChanged: false, ordinalBefore: 1, ordinalAfter: 1 });
      expect(fig.seriesBefore[0].version).toBe(1);
      expect(fig.seriesAfter[0].version).toBe(2);
      const trend = fig.values.find((v) => v.key === 'trend.perDecade')!;
      expect(trend.before).toBe(first.numbers[0].value);
      expect(trend.after).toBe(live.numbers.find((n) => n.key === 'trend.perDecade')!.value);
      expect(cmp.numbers[0]).toMatchObject({ status: 'changed', ordinalBefore: 1, ordinalAfter: 1, before: trend.before, after: trend.after });
      await request(t.url).get(`/api/snapshots/${first.id}/compare?with=tomorrow`).set(reader.auth).expect(400);
      await request(t.url).get(`/api/snapshots/${first.id}/compare?with=live`).set(outsider.auth).expect(404);
    });

    it('compares two snapshots of the same notebook', async () => {
      const later = (await publish(lead, 'Revised release').expect(201)).body as SnapshotView;
      const cmp = (await request(t.url).get(`/api/snapshots/${first.id}/compare?with=${later.id}`).set(reader.auth).expect(200)).body as SnapshotComparison;
      expect(cmp.to).toMatchObject({ kind: 'snapshot', id: later.id, number: later.number, title: 'Revised release' });
      expect(cmp.text.some((p) => p.op === 'insert' && p.text.includes('revised'))).toBe(true);
      expect(cmp.figures.find((f) => f.figureId === 'fig-broken')?.status).toBe('unchanged');
      expect(cmp.figures.find((f) => f.figureId === 'fig-flux')?.status).toBe('changed');
      // A snapshot of another notebook is not comparable.
      const otherNb = (await buildNotebook(t.url, groupId, lead, [], 'Another notebook')).id;
      const foreign = (await request(t.url).post(`/api/notebooks/${otherNb}/snapshots`).set(lead.auth).send({ title: 'x' }).expect(201)).body as SnapshotView;
      await request(t.url).get(`/api/snapshots/${first.id}/compare?with=${foreign.id}`).set(lead.auth).expect(404);
    });
  });
});
