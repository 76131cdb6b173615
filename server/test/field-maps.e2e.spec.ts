import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ImportUploadResponse, MapResponse, UploadPreview } from '@upwell/common';
import { mapsReference } from '../../common/test-fixtures/maps-reference';
import { fixture } from './fixtures/netcdf/fixture-path';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { startTestApp, type TestApp } from './test-app';

// Reference: common/test-fixtures/maps-reference.json, made by common/test-fixtures/scripts/maps_reference.py
// (numpy/xarray means and climatologies, scipy Welch and t tests, statsmodels fdr_bh) from the same data it
// writes to server/test/fixtures/netcdf/maps-field.nc (float32, descending latitudes, longitudes −180…180,
// land cells and missing months as _FillValue). Values and p compared to 1e-9 (float64 sums in another order).
const ref = mapsReference();
const byName = (name: string) => ref.cases.find((c) => c.name === name)!;

function expectMatches(res: MapResponse, name: string) {
  const c = byName(name);
  expect(res.lat).toEqual(c.lat);
  expect(res.lon).toEqual(c.lon);
  const close = (got: (number | null)[], want: (number | null)[], what: string) =>
    want.forEach((w, i) => (w === null ? expect(got[i], `${what}[${i}]`).toBeNull() : expect(Math.abs(got[i]! - w), `${what}[${i}]`).toBeLessThan(1e-9)));
  close(res.values, c.values, 'values');
  if (c.p) close(res.p!, c.p, 'p');
  if (c.fdr) {
    expect(res.significant).toEqual(c.fdr.significant);
    expect(res.counts).toMatchObject({ significantPointwise: c.fdr.pointwise, significantFdr: c.fdr.fdr, tested: c.fdr.tested });
  }
}

describe('POST /api/fields/:fieldId/maps over HTTP on an uploaded NetCDF file', () => {
  let t: TestApp;
  let u: TestUser;
  let outsider: TestUser;
  let groupId: string;
  let fieldId: string;
  const base = { from: '2000-01', to: '2009-12' };
  const post = (body: unknown, who: TestUser = u) => request(t.url).post(`/api/fields/${fieldId}/maps`).set(who.auth).send(body as object);

  beforeAll(async () => {
    t = await startTestApp();
    u = await buildUser(t.url);
    outsider = await buildUser(t.url, 'Someone Else');
    groupId = (await buildGroup(t.url, u)).id;
    const preview = (await request(t.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', readFileSync(fixture('maps-field.nc')), { filename: 'maps-field.nc' }).expect(201)).body as UploadPreview;
    const imported = (await request(t.url).post(`/api/uploads/${preview.uploadId}/import`).set(u.auth).send({ grids: [{ variable: 'dic', name: 'Fictional carbon' }] }).expect(200)).body as ImportUploadResponse;
    fieldId = imported.fields[0].id;
  });
  afterAll(() => t.close());

  it('mean over DJF in a box across the antimeridian matches xarray, with unwrapped longitudes and the field’s units', async () => {
    const c = byName('mean DJF 2000-12..2009-02, box across the antimeridian, lon 180');
    const res = (await post(c.request).expect(200)).body as MapResponse;
    expectMatches(res, c.name);
    expect(res.units).toBe('mol m-2');
    expect(res.p).toBeUndefined();
  });

  it('correlation at lag 2 on an inline index matches numpy/scipy (r, nEff t-test p) and statsmodels fdr_bh', async () => {
    const c = byName('correlation, lag 2');
    const res = (await post({ ...c.request, index: ref.index }).expect(200)).body as MapResponse;
    expectMatches(res, c.name);
    expect(res.units).toBe('1');
    expect(res.warnings.join(' ')).toMatch(/Benjamini–Hochberg/);
  });

  it('regression on a stored index series (by id, latest version) gives numpy’s slopes in field units per index unit', async () => {
    const lines = ['date,index'];
    ref.index.values.forEach((v, i) => {
      const m = Number(ref.index.start.slice(5)) - 1 + i;
      lines.push(`${Number(ref.index.start.slice(0, 4)) + Math.floor(m / 12)}-${String((m % 12) + 1).padStart(2, '0')}-15,${v === null ? '' : String(v)}`);
    });
    const up = (await request(t.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', Buffer.from(lines.join('\n') + '\n'), { filename: 'index.csv' }).expect(201)).body;
    const imp = (await request(t.url).post(`/api/uploads/${up.uploadId}/import`).set(u.auth).send({ origin: 'observation', columns: [{ column: 'index', skip: false, name: 'Invented index', kind: 'climate-index', variable: 'sst', units: 'degC' }] }).expect(200)).body;
    const seriesId = imp.series[0].id as string;
    const c = byName('regression, lag 2');
    const res = (await post({ ...c.request, index: { seriesId } }).expect(200)).body as MapResponse;
    expectMatches(res, c.name);
    expect(res.units).toBe('mol m-2 per (degC)');
  });

  it('a warm-minus-neutral composite from a saved event set matches scipy’s Welch test per cell', async () => {
    const nb = await buildNotebook(t.url, groupId, u);
    const set = (await request(t.url).post(`/api/notebooks/${nb.id}/event-sets`).set(u.auth).send({ name: 'Invented events', events: ref.events.map((e) => ({ ...e, label: '' })) }).expect(201)).body;
    const c = byName('warm composite, peak + 1..3, minus neutral');
    const res = (await post({ ...c.request, eventSetId: set.id }).expect(200)).body as MapResponse;
    expectMatches(res, c.name);
    expect(res.counts).toMatchObject({ eventMonths: c.eventMonths, neutralMonths: c.neutralMonths });
    expect(res.warnings.join(' ')).toMatch(/serially correlated/);
  });

  it('an anomaly map leaves the cell whose February climatology fails the 80 % rule null', async () => {
    const c = byName('anomaly at February 2004 (a cell fails the 80 % rule)');
    expectMatches((await post(c.request).expect(200)).body, c.name);
  });

  it('phase-randomised p (Ebisuzaki 1997, seeded) is reproducible and absent for the one cell with missing months', async () => {
    const body = { mode: 'correlation', index: ref.index, lag: 2, significance: 'phase-randomised', surrogates: 200, seed: 3, base, period: { from: '2008-01', to: '2009-12' } };
    const a = (await post(body).expect(200)).body as MapResponse;
    const b = (await post(body).expect(200)).body as MapResponse;
    expect(a.p).toEqual(b.p);
    expect(a.p!.filter((p) => p !== null)).toHaveLength(69);
    expect(a.warnings.join(' ')).toMatch(/1 cells with missing months have no p/);
  });

  it('answers bad input with a 400 naming the problem, and an outsider with 404', async () => {
    expect((await post({ mode: 'correlation', base }).expect(400)).body.message).toMatch(/index/);
    expect((await post({ mode: 'mean', months: 'JAJ' }).expect(400)).body.message).toMatch(/season/);
    expect((await post({ mode: 'mean', period: { from: '2005-01', to: '2004-01' } }).expect(400)).body.message).toMatch(/period/);
    expect((await post({ mode: 'mean', period: { from: '2020-01', to: '2021-01' } }).expect(400)).body.message).toMatch(/does not overlap/);
    expect((await post({ mode: 'mean', region: { lat: [60, 70] } }).expect(400)).body.message).toMatch(/no cell centre/);
    expect((await post({ mode: 'composite' }).expect(400)).body.message).toMatch(/eventSetId/);
    expect((await post({ mode: 'correlation', index: ref.index, significance: 'phase-randomised', base }).expect(400)).body.message).toMatch(/every month of the period/);
    expect((await post({ mode: 'mean', lag: 3 }).expect(400)).body.message).toMatch(/lag/);
    await post({ mode: 'mean' }, outsider).expect(404);
  });
});
