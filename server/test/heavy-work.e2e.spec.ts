import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ImportUploadResponse, UploadPreview } from '@upwell/common';
import { writeCraftedField } from './crafted-netcdf';
import { buildGroup, buildUser, type TestUser } from './factories';
import { startServer } from './child-server';
import { startTestApp, type TestApp } from './test-app';

// Heavy NetCDF work runs in worker threads (server/src/jobs) and malformed or oversized files are
// refused before allocation. Files are crafted here (server/test/crafted-netcdf.ts), never committed.
describe('heavy NetCDF work over HTTP', () => {
  let t: TestApp;
  let u: TestUser;
  let groupId: string;
  beforeAll(async () => {
    t = await startTestApp({ JOB_WORKERS: '1' });
    u = await buildUser(t.url);
    groupId = (await buildGroup(t.url, u)).id;
  });
  afterAll(() => t.close());

  const upload = (path: string) => request(t.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', path);

  it('answers "CDF\\x01" + 100 zero bytes with a 422 saying the file declares no variables', async () => {
    const path = join(t.dataDir, 'zeros.nc');
    writeFileSync(path, Buffer.concat([Buffer.from('CDF\x01', 'latin1'), Buffer.alloc(100)]));
    const res = await upload(path).expect(422);
    expect(res.body.message).toMatch(/declares no variables/);
  });

  it('answers a header declaring 1.5 GiB in a 70 kB file with a 422 naming the variable', async () => {
    const path = join(t.dataDir, 'declares-big.nc');
    writeCraftedField(path, 24, 4096, 4096, 70_000);
    const res = await upload(path).expect(422);
    expect(res.body.message).toMatch(/variable dic \(time=24, lat=4096, lon=4096\) needs bytes .* but the file has 70000 bytes/);
  });

  it('keeps /api/health answering within 1 s while a reduction of a 90 MB field runs, and answers the reduction', async () => {
    // A small honest file goes in through the real upload and import; then its stored bytes are
    // replaced by a big one of the same layout (8 months × 1200 × 2400 float cells, a sparse hole of
    // zeros), so the reduction has real work without uploading 90 MB in a test.
    const small = join(t.dataDir, 'small-field.nc');
    writeCraftedField(small, 8, 12, 24);
    const preview = (await upload(small).expect(201)).body as UploadPreview;
    const imported = (await request(t.url).post(`/api/uploads/${preview.uploadId}/import`).set(u.auth).send({ grids: [{ variable: 'dic', name: 'crafted DIC' }] }).expect(200)).body as ImportUploadResponse;
    writeCraftedField(join(t.dataDir, 'uploads', `${preview.uploadId}.nc`), 8, 1200, 2400);

    let done = false;
    const reduction = request(t.url)
      .post(`/api/fields/${imported.fields[0].id}/reductions`)
      .set(u.auth)
      .send({ kind: 'box-mean', name: 'Global mean of the crafted field', lat: [-90, 90], lon: [0, 360] })
      .then((res) => ((done = true), res));
    const latencies: number[] = [];
    while (!done) {
      const started = performance.now();
      await request(t.url).get('/api/health').expect(200);
      latencies.push(performance.now() - started);
      await new Promise((r) => setTimeout(r, 50));
    }
    const res = await reduction;
    expect(res.status).toBe(200);
    const values = (await request(t.url).get(`/api/series/${res.body.series.id}/versions/latest/values`).set(u.auth).expect(200)).body;
    expect(values.values).toEqual([0, 0, 0, 0, 0, 0, 0, 0]);
    const worst = Math.max(...latencies);
    console.log(`health during a reduction: ${latencies.length} probes, worst ${worst.toFixed(1)} ms, median ${latencies.sort((a, b) => a - b)[latencies.length >> 1].toFixed(1)} ms`);
    expect(latencies.length).toBeGreaterThan(1);
    // Liveness bound the issue asks for (issue 23, item 1): on the event loop this reduction blocked health for its whole run.
    expect(worst).toBeLessThan(1000);
  });

  it('answers a box wider than NETCDF_MAX_READ_CELLS with a 422 naming the limit, not a 500', async () => {
    const limited = await startTestApp({ JOB_WORKERS: '1', NETCDF_MAX_READ_CELLS: '200' });
    try {
      const person = await buildUser(limited.url);
      const group = (await buildGroup(limited.url, person)).id;
      const path = join(limited.dataDir, 'field.nc');
      writeCraftedField(path, 2, 12, 24);
      const preview = (await request(limited.url).post(`/api/groups/${group}/uploads`).set(person.auth).attach('file', path).expect(201)).body as UploadPreview;
      const imported = (await request(limited.url).post(`/api/uploads/${preview.uploadId}/import`).set(person.auth).send({ grids: [{ variable: 'dic', name: 'crafted' }] }).expect(200)).body as ImportUploadResponse;
      const res = await request(limited.url).post(`/api/fields/${imported.fields[0].id}/reductions`).set(person.auth).send({ kind: 'box-mean', name: 'too wide', lat: [-90, 90], lon: [0, 360] }).expect(422);
      expect(res.body.message).toMatch(/12 latitude rows × 24 longitudes = 288 cells.*NETCDF_MAX_READ_CELLS/);
    } finally {
      await limited.close();
    }
  });

  it('runs jobs in the built server too (server/dist/jobs/job-worker.js beside the compiled runner)', async () => {
    const dataDir = mkdtempSync(join(tmpdir(), 'upwell-built-jobs-'));
    const built = await startServer(dataDir, { JOB_WORKERS: '1' });
    try {
      const person = await buildUser(built.url);
      const group = (await buildGroup(built.url, person)).id;
      const path = join(dataDir, 'field.nc');
      writeCraftedField(path, 3, 12, 24);
      const preview = (await request(built.url).post(`/api/groups/${group}/uploads`).set(person.auth).attach('file', path).expect(201)).body as UploadPreview;
      expect(preview.netcdf!.variables.find((v) => v.name === 'dic')).toMatchObject({ use: 'grid', shape: [3, 12, 24], start: '2000-01' });
    } finally {
      built.child.kill('SIGTERM');
      rmSync(dataDir, { recursive: true, force: true });
    }
  });
});
