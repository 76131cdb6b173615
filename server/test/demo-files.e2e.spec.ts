import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ImportUploadResponse, ReduceFieldResponse, UploadPreview, ZonalMeanFieldView } from '@upwell/common';
import { DEMO_FILES, writeDemoFiles, type DemoManifest } from '@upwell/demo-generator';
import { buildGroup, buildUser, type TestUser } from './factories';
import { startTestApp, type TestApp } from './test-app';

// The demo files go through the app's own upload and import routes, described by their manifest.
describe('demo files through the upload and import routes', () => {
  let t: TestApp;
  let u: TestUser;
  let groupId: string;
  let dir: string;
  let manifest: DemoManifest;
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'upwell-demo-e2e-'));
    manifest = await writeDemoFiles(dir, { release: 1 });
    t = await startTestApp();
    u = await buildUser(t.url);
    groupId = (await buildGroup(t.url, u)).id;
  });
  afterAll(async () => {
    await t.close();
    await rm(dir, { recursive: true, force: true });
  });

  const upload = async (file: string) => (await request(t.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', join(dir, file)).expect(201)).body as UploadPreview;

  it('imports every CSV series of the manifest under its name, kind, units and origin', async () => {
    for (const file of [DEMO_FILES.index, DEMO_FILES.budget, DEMO_FILES.inventory]) {
      const entries = manifest.series.filter((s) => s.file === file);
      const preview = await upload(file);
      const columns = entries.map((s) => ({
        column: s.column, skip: false, name: s.name, kind: s.kind, variable: s.variable, units: s.units,
        region: s.region, depthLayer: s.depthLayer, source: s.source, notes: s.description,
      }));
      const imported = (await request(t.url).post(`/api/uploads/${preview.uploadId}/import`).set(u.auth).send({ origin: entries[0].origin, columns }).expect(200)).body as ImportUploadResponse;
      expect(imported.series.map((s) => s.name)).toEqual(entries.map((s) => s.name));
      for (const [k, s] of imported.series.entries()) {
        const detail = (await request(t.url).get(`/api/series/${s.id}`).set(u.auth).expect(200)).body;
        expect(detail).toMatchObject({ name: entries[k].name, kind: entries[k].kind, units: entries[k].units, origin: entries[k].origin });
        const v = (await request(t.url).get(`/api/series/${s.id}/versions/latest/values`).set(u.auth).expect(200)).body;
        expect([v.start, v.values.length]).toEqual(['1980-01', 552]);
      }
    }
  });

  it('keeps the NetCDF-4 field and reduces it to the named zonal mean over 20°S–20°N', async () => {
    const field = manifest.fields[0];
    const preview = await upload(field.file);
    expect(preview.netcdf!.variables.find((v) => v.name === field.variable)).toMatchObject({ use: 'grid', dims: ['time', 'lat', 'lon'], shape: [552, 20, 60], units: field.units, longName: field.longName });
    const imported = (await request(t.url).post(`/api/uploads/${preview.uploadId}/import`).set(u.auth).send({ origin: field.origin, grids: [{ variable: field.variable, name: field.longName }] }).expect(200)).body as ImportUploadResponse;
    const zonal = (await request(t.url).post(`/api/fields/${imported.fields[0].id}/reductions`).set(u.auth).send({ kind: 'zonal-mean', name: field.zonalMeanName, lat: field.lat, lon: field.lon }).expect(200)).body as ReduceFieldResponse;
    const view = (await request(t.url).get(`/api/zonal-fields/${zonal.zonal!.id}`).set(u.auth).expect(200)).body as ZonalMeanFieldView;
    expect(view.months).toBe(552);
    expect(view.latitudes).toEqual(Array.from({ length: 20 }, (_, j) => -19 + 2 * j));
    expect(view.values![0].every((x) => x !== null && x > 1950 && x < 2100)).toBe(true);
  });
});
