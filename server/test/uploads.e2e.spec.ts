import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SOCKET_EVENTS, type SeriesVersionCreatedEvent, type UploadPreview } from '@upwell/common';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildUser, type TestUser } from './factories';
import { collect, connectSocket, eventually } from './socket-client';

const FIXTURES = join(__dirname, 'fixtures', 'csv');

describe('the series library over HTTP and socket.io', () => {
  let t: TestApp;
  let admin: TestUser;
  let member: TestUser;
  let outsider: TestUser;
  let groupId: string;

  beforeAll(async () => {
    t = await startTestApp();
    [admin, member, outsider] = await Promise.all([buildUser(t.url, 'admin'), buildUser(t.url, 'member'), buildUser(t.url, 'outsider')]);
    groupId = (await buildGroup(t.url, admin, [member])).id;
  });
  afterAll(() => t.close());

  const upload = (who: TestUser, file: string | Buffer, name = 'upload.csv', gid = groupId) =>
    request(t.url)
      .post(`/api/groups/${gid}/uploads`)
      .set(who.auth)
      .attach('file', typeof file === 'string' ? join(FIXTURES, file) : file, typeof file === 'string' ? undefined : { filename: name });
  const list = async () => (await request(t.url).get(`/api/groups/${groupId}/series`).set(admin.auth).expect(200)).body;
  const mapBoth = {
    origin: 'model-output',
    columns: [
      { column: 'nino_like_index', skip: false, name: 'Niño-like index', kind: 'climate-index', variable: 'sst_anomaly', units: 'degC' },
      { column: 'dic_0_100m_PgC', skip: false, name: 'DIC 0–100 m', kind: 'carbon-inventory', variable: 'dic', units: 'Pg C', depthLayer: { topM: 0, bottomM: 100 } },
    ],
  };

  it('previews a CSV without storing anything, then makes series from the mapping and tells the group', async () => {
    const adminSocket = await connectSocket(t.url, admin.accessToken);
    const outsiderSocket = await connectSocket(t.url, outsider.accessToken);
    const heard = collect<SeriesVersionCreatedEvent>(adminSocket, SOCKET_EVENTS.seriesVersionCreated);
    const overheard = collect(outsiderSocket, SOCKET_EVENTS.seriesVersionCreated);

    const res = await upload(member, 'long-two-columns.csv').expect(201);
    const preview = res.body as UploadPreview;
    expect(preview).toMatchObject({ fileName: 'long-two-columns.csv', format: 'csv', netcdf: null });
    expect(preview.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(preview.csv!.series.map((s) => s.column)).toEqual(['nino_like_index', 'dic_0_100m_PgC']);
    expect((await list()).total).toBe(0);

    const imported = await request(t.url).post(`/api/uploads/${preview.uploadId}/import`).set(member.auth).send(mapBoth).expect(200);
    expect(imported.body.series).toHaveLength(2);
    expect(imported.body.series.every((s: { version: number; created: boolean }) => s.version === 1 && s.created)).toBe(true);

    const page = await list();
    expect(page.total).toBe(2);
    const dic = page.items.find((s: { name: string }) => s.name === 'DIC 0–100 m');
    expect(dic).toMatchObject({ kind: 'carbon-inventory', units: 'Pg C', depthLayer: '0–100 m', origin: 'model-output', latest: { number: 1 } });
    expect(dic.sparkline.length).toBeGreaterThan(1);

    // The stored values are exactly the file's column (fixture line 2 onwards: 38.112, 38.120, ...).
    const values = await request(t.url).get(`/api/series/${dic.id}/versions/latest/values`).set(member.auth).expect(200);
    expect(values.body.start).toBe(preview.csv!.series[1].start);
    expect(values.body.values).toEqual(preview.csv!.series[1].values);
    expect(values.body.values.slice(0, 3)).toEqual([38.112, 38.12, 38.131]);

    const csv = await request(t.url).get(`/api/series/${dic.id}/versions/1/csv`).set(member.auth).expect(200);
    expect(csv.headers['content-type']).toContain('text/csv');
    expect(csv.text.split('\n').slice(0, 2)).toEqual(['month,value', '1997-01,38.112']);

    await eventually(() => heard.length === 2, 3000, 'two version events');
    expect(heard.map((e) => e.name).sort()).toEqual(['DIC 0–100 m', 'Niño-like index']);
    expect(overheard).toEqual([]);
    adminSocket.disconnect();
    outsiderSocket.disconnect();
  });

  it('adds a new version when a changed file is uploaded for an existing series, and none for the same values', async () => {
    const page = await list();
    const dic = page.items.find((s: { name: string }) => s.name === 'DIC 0–100 m');
    const changed = readFileSync(join(FIXTURES, 'long-two-columns.csv'), 'utf8').replace('38.112', '38.500');
    const preview = (await upload(member, Buffer.from(changed), 'release-2.csv').expect(201)).body as UploadPreview;
    const mapping = { columns: [{ ...mapBoth.columns[1] }], targets: { dic_0_100m_PgC: dic.id } };
    const v2 = await request(t.url).post(`/api/uploads/${preview.uploadId}/import`).set(member.auth).send(mapping).expect(200);
    expect(v2.body.series).toEqual([{ id: dic.id, name: 'DIC 0–100 m', version: 2, created: true }]);

    const again = (await upload(member, Buffer.from(changed), 'release-2-again.csv').expect(201)).body as UploadPreview;
    const same = await request(t.url).post(`/api/uploads/${again.uploadId}/import`).set(member.auth).send(mapping).expect(200);
    expect(same.body.series[0]).toMatchObject({ version: 2, created: false });

    const detail = await request(t.url).get(`/api/series/${dic.id}`).set(member.auth).expect(200);
    expect(detail.body.versions.map((v: { number: number }) => v.number)).toEqual([2, 1]);
    expect(detail.body.versions[0].file.name).toBe('release-2.csv');
    expect(detail.body.versions[0].transform).toEqual({ type: 'csv-column', column: 'dic_0_100m_PgC', layout: 'long' });
    const v1 = await request(t.url).get(`/api/series/${dic.id}/versions/1/values`).set(member.auth).expect(200);
    const latest = await request(t.url).get(`/api/series/${dic.id}/versions/latest/values`).set(member.auth).expect(200);
    expect(v1.body.values[0]).toBe(38.112);
    expect(latest.body.values[0]).toBe(38.5);
    await request(t.url).get(`/api/series/${dic.id}/versions/9/values`).set(member.auth).expect(404);
  });

  it('reads the real Niño 1+2 table (wide layout) into one series with the file’s values', async () => {
    const preview = (await upload(member, 'elnino-nino12-wide.csv').expect(201)).body as UploadPreview;
    expect(preview.csv!.layout.kind).toBe('wide');
    const imp = await request(t.url)
      .post(`/api/uploads/${preview.uploadId}/import`)
      .set(member.auth)
      .send({ origin: 'observation', columns: [{ column: preview.csv!.series[0].column, skip: false, name: 'Niño 1+2 SST', kind: 'climate-index', variable: 'sst', units: 'degC' }] })
      .expect(200);
    const values = (await request(t.url).get(`/api/series/${imp.body.series[0].id}/versions/latest/values`).set(member.auth).expect(200)).body;
    expect(values.start).toBe('1950-01');
    expect(values.values).toHaveLength(61 * 12);
    // Values read off the file itself (statsmodels elnino.csv, rows 1983 and 1998, column MAR).
    expect(values.values[(1983 - 1950) * 12 + 2]).toBe(28.85);
    expect(values.values[(1998 - 1950) * 12 + 2]).toBe(29.24);
  });

  it('enforces who may upload, edit and delete', async () => {
    await upload(outsider, 'long-two-columns.csv').expect(404);
    const someone = (await list()).items[0];
    await request(t.url).get(`/api/series/${someone.id}`).set(outsider.auth).expect(404);
    await request(t.url).patch(`/api/series/${someone.id}`).set(member.auth).send({ notes: 'checked against release notes' }).expect(200);
    await request(t.url).patch(`/api/series/${someone.id}`).set(outsider.auth).send({ notes: 'x' }).expect(404);
    await request(t.url).delete(`/api/series/${someone.id}`).set(member.auth).expect(403);
    await request(t.url).delete(`/api/series/${someone.id}`).set(admin.auth).expect(204);
    await request(t.url).get(`/api/series/${someone.id}`).set(admin.auth).expect(404);
    await request(t.url).post(`/api/groups/${groupId}/uploads`).attach('file', join(FIXTURES, 'long-two-columns.csv')).expect(401);
  });

  it('refuses the bad-input corpus with a clear 4xx each, stores nothing and keeps serving', async () => {
    const before = (await list()).total;
    const bad = readdirSync(join(FIXTURES, 'bad'));
    let refused = 0;
    for (const file of bad) {
      const res = await upload(member, join('bad', file));
      expect(res.status, `${file}: ${JSON.stringify(res.body)}`).toBeLessThan(500);
      if (res.status >= 400) {
        refused++;
        expect(res.body.message, file).toEqual(expect.any(String));
        expect(res.body.message.length, file).toBeGreaterThan(10);
      }
    }
    expect(refused).toBeGreaterThanOrEqual(20);
    expect((await list()).total).toBe(before);
    // No half-written upload stays behind in DATA_DIR.
    expect(readdirSync(join(t.dataDir, 'uploads', 'tmp'))).toEqual([]);
    await request(t.url).get('/api/health').expect(200);
  });

  it('refuses a missing file, a wrong field and bad options with 400', async () => {
    await request(t.url).post(`/api/groups/${groupId}/uploads`).set(member.auth).field('x', '1').expect(400);
    await request(t.url).post(`/api/groups/${groupId}/uploads`).set(member.auth).attach('data', join(FIXTURES, 'long-two-columns.csv')).expect(400);
    const res = await request(t.url).post(`/api/groups/${groupId}/uploads`).set(member.auth).field('options', '{"delimiter":"pipe"}').attach('file', join(FIXTURES, 'long-two-columns.csv')).expect(400);
    expect(res.body.message).toContain('delimiter');
  });

  it('stores the calendar chosen at import on the series version (default standard; an unknown name is a 400)', async () => {
    const staged = (options?: string) => {
      const req = request(t.url).post(`/api/groups/${groupId}/uploads`).set(member.auth);
      return (options ? req.field('options', options) : req).attach('file', join(FIXTURES, 'long-two-columns.csv')).expect(201);
    };
    const only = (name: string) => ({ origin: 'model-output', columns: [{ ...mapBoth.columns[0], name }, { column: 'dic_0_100m_PgC', skip: true }] });
    for (const [options, name, calendar] of [['{"calendar":"360_day"}', 'index 360-day', '360_day'], ['{"calendar":"365_day"}', 'index 365-day', 'noleap'], [undefined, 'index standard', 'standard']] as const) {
      const preview = (await staged(options)).body as UploadPreview;
      const imported = await request(t.url).post(`/api/uploads/${preview.uploadId}/import`).set(member.auth).send(only(name)).expect(200);
      const detail = (await request(t.url).get(`/api/series/${imported.body.series[0].id}`).set(member.auth).expect(200)).body;
      expect(detail.versions[0].calendar, name).toBe(calendar);
    }
    const bad = await request(t.url).post(`/api/groups/${groupId}/uploads`).set(member.auth).field('options', '{"calendar":"lunar"}').attach('file', join(FIXTURES, 'long-two-columns.csv')).expect(400);
    expect(bad.body.message).toContain('calendar');
  });

  it('refuses a socket without a valid token', async () => {
    const { io } = await import('socket.io-client');
    const socket = io(t.url, { auth: { token: 'forged' }, transports: ['websocket'], reconnection: false, forceNew: true });
    const said: string[] = [];
    socket.on(SOCKET_EVENTS.error, (e: { message: string }) => said.push(e.message));
    await new Promise((r) => socket.once('disconnect', r));
    expect(said[0]).toContain('sign in');
  });

  it('honours the upload size limit with 413', async () => {
    const small = await startTestApp({ UPLOAD_MAX_BYTES: '1000' });
    try {
      const u = await buildUser(small.url);
      const g = await buildGroup(small.url, u);
      const big = Buffer.from('date,x\n' + Array.from({ length: 200 }, (_, i) => `${1900 + Math.floor(i / 12)}-${String((i % 12) + 1).padStart(2, '0')},1.0`).join('\n'));
      const res = await request(small.url).post(`/api/groups/${g.id}/uploads`).set(u.auth).attach('file', big, { filename: 'big.csv' }).expect(413);
      expect(res.body.message).toMatch(/large|limit/i);
      expect(readdirSync(join(small.dataDir, 'uploads', 'tmp'))).toEqual([]);
    } finally {
      await small.close();
    }
  });
});
