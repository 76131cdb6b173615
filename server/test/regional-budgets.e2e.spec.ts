import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PGC_PER_MOL, PGC_PER_YEAR_PER_MOL_PER_SECOND, type RegionalBudgetResponse, type RegionSetView, type UploadPreview } from '@upwell/common';
import { buildGroup, buildUser, type TestUser } from './factories';
import { startTestApp, type TestApp } from './test-app';

// Fixtures and reference values: common/test-fixtures/scripts/grids_reference.py (netCDF4-python writes the files,
// xarray DataArray.weighted(volume).sum() integrates them).
const GRIDS = join(__dirname, '..', '..', 'common', 'test-fixtures', 'grids');
const ref = JSON.parse(readFileSync(join(GRIDS, 'grids_reference.json'), 'utf8')) as {
  nt: number;
  regions: Record<string, { full_depth_mol_s: Record<string, number[]>; top_100m_mol_s: Record<string, number[]>; inventory_full_mol: number[]; inventory_0_100m_mol: number[] }>;
};
const TERMS = [
  { variable: 'dic_tend', role: 'tendency' },
  { variable: 'dic_adv', role: 'advection' },
  { variable: 'dic_dif', role: 'diffusion' },
  { variable: 'dic_bio', role: 'biology' },
  { variable: 'dic_airsea', role: 'air-sea-flux' },
  { variable: 'dic_other', role: 'other' },
];

describe('region sets and regional budgets on a native grid over HTTP', () => {
  let t: TestApp;
  let u: TestUser;
  let groupId: string;
  beforeAll(async () => {
    t = await startTestApp();
    u = await buildUser(t.url);
    groupId = (await buildGroup(t.url, u)).id;
  });
  afterAll(() => t.close());

  const upload = async (file: string) => ((await request(t.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', join(GRIDS, file)).expect(201)).body as UploadPreview).uploadId;
  const seriesCount = async () => (await request(t.url).get(`/api/groups/${groupId}/series`).set(u.auth).query({ pageSize: 1 }).expect(200)).body.total as number;
  const maskSet = async (file: string, name = 'Basins') =>
    (await request(t.url).post(`/api/groups/${groupId}/region-sets`).set(u.auth).send({ name, source: { kind: 'mask', uploadId: await upload(file), variable: 'basin' } }).expect(201)).body as RegionSetView;

  it('stores a NetCDF flag mask as a region set, versioned, with the regions and cell counts of the file', async () => {
    const set = await maskSet('grids_regions.nc');
    expect(set.versions).toHaveLength(1);
    expect(set.versions[0]).toMatchObject({ number: 1, kind: 'mask', grid: { dims: ['y', 'x'], shape: [20, 36] } });
    expect(set.versions[0].regions.map((r) => r.name)).toEqual(['tropical_pacific', 'northern_band', 'rest_of_ocean']);
    const v2 = (await request(t.url).post(`/api/region-sets/${set.id}/versions`).set(u.auth).send({ source: { kind: 'standard-boxes', boxIds: ['nino34', 'nino4'] } }).expect(201)).body as RegionSetView;
    expect(v2.versions.map((v) => v.kind)).toEqual(['mask', 'standard-boxes']);
    const list = (await request(t.url).get(`/api/groups/${groupId}/region-sets`).set(u.auth).expect(200)).body;
    expect(list.regionSets.map((s: RegionSetView) => s.id)).toContain(set.id);
  });

  it('computes 0–100 m and full-depth budgets per region as series equal to xarray\'s integrals, closing to 1e-10', async () => {
    const set = await maskSet('grids_regions.nc', 'Basins for budget');
    const uploadId = await upload('grids_budget.nc');
    const res = (
      await request(t.url)
        .post(`/api/groups/${groupId}/regional-budgets`)
        .set(u.auth)
        .send({ uploadId, regionSetId: set.id, terms: TERMS, inventoryVariable: 'dissic', depthLimits: [100], namePrefix: 'Synthetic DIC', units: 'Pg C/yr' })
        .expect(200)
    ).body as RegionalBudgetResponse;
    // 3 regions × 2 depth ranges × (6 terms + residual + inventory)
    expect(res.series).toHaveLength(3 * 2 * 8);
    for (const c of res.closure) expect(c.relativeClosure!, `${c.region} ${c.depth}`).toBeLessThan(1e-10);

    const get = async (region: string, depth: string, quantity: string) => {
      const s = res.series.find((x) => x.region === region && x.depth === depth && x.quantity === quantity)!;
      return (await request(t.url).get(`/api/series/${s.id}/versions/latest/values`).set(u.auth).expect(200)).body as { start: string; values: number[]; units: string };
    };
    const adv = await get('tropical_pacific', '0–100 m', 'advection');
    expect(adv.start).toBe('2000-01');
    expect(adv.units).toBe('Pg C/yr');
    const expected = ref.regions.tropical_pacific.top_100m_mol_s.dic_adv.map((x) => x * PGC_PER_YEAR_PER_MOL_PER_SECOND);
    for (let i = 0; i < ref.nt; i++) expect(adv.values[i] / expected[i]).toBeCloseTo(1, 10);
    const inv = await get('northern_band', 'full depth', 'inventory');
    for (let i = 0; i < ref.nt; i++) expect(inv.values[i] / (ref.regions.northern_band.inventory_full_mol[i] * PGC_PER_MOL)).toBeCloseTo(1, 10);

    const detail = (await request(t.url).get(`/api/series/${res.series[0].id}`).set(u.auth).expect(200)).body;
    expect(detail.origin).toBe('derived');
    expect(JSON.stringify(detail)).toContain('regional-budget');

    // The same request again stores no new version (the values are identical).
    const again = (await request(t.url).post(`/api/groups/${groupId}/regional-budgets`).set(u.auth).send({ uploadId, regionSetId: set.id, terms: TERMS, inventoryVariable: 'dissic', depthLimits: [100], namePrefix: 'Synthetic DIC' }).expect(200)).body as RegionalBudgetResponse;
    expect(again.series.every((s) => !s.created)).toBe(true);
  });

  it('refuses bad input with a clear 4xx and stores nothing', async () => {
    const before = await seriesCount();
    const mismatched = await maskSet('grids_mismatch.nc', 'Wrong grid');
    const budgetUpload = await upload('grids_budget.nc');
    const body = { uploadId: budgetUpload, regionSetId: mismatched.id, terms: TERMS, namePrefix: 'Bad' };
    const grid = await request(t.url).post(`/api/groups/${groupId}/regional-budgets`).set(u.auth).send(body).expect(400);
    expect(grid.body.message).toMatch(/mask on a 19 × 36 grid .* the budget terms are on 20 × 36/);

    const noAreas = await upload('grids_no_areas.nc');
    const boxes = (await request(t.url).post(`/api/groups/${groupId}/region-sets`).set(u.auth).send({ name: 'Niño', source: { kind: 'standard-boxes', boxIds: ['nino34'] } }).expect(201)).body as RegionSetView;
    const flux = await request(t.url).post(`/api/groups/${groupId}/regional-budgets`).set(u.auth).send({ uploadId: noAreas, regionSetId: boxes.id, terms: [{ variable: 'fgco2', role: 'tendency' }], namePrefix: 'Bad' });
    expect(flux.status).toBe(400); // a 2-D flux is not a 3-D budget term
    const bounds = await request(t.url).post(`/api/groups/${groupId}/regional-budgets`).set(u.auth).send({ uploadId: await upload('grids_no_bounds.nc'), regionSetId: boxes.id, terms: [{ variable: 'dissic', role: 'tendency' }], namePrefix: 'Bad' });
    expect(bounds.status).toBe(400); // refused on its units first; the missing bounds are refused in native-grid.spec.ts
    expect(bounds.body.message).toMatch(/units "mol m-3"; budget terms must be rates/);

    // A polygon region with no cell of the grid (a small square in the Arctic, outside the rotated band's cells)
    const far = { type: 'FeatureCollection', features: [{ type: 'Feature', properties: { name: 'nowhere' }, geometry: { type: 'Polygon', coordinates: [[[10, 89], [11, 89], [11, 89.5], [10, 89.5], [10, 89]]] } }] };
    const empty = (await request(t.url).post(`/api/groups/${groupId}/region-sets`).set(u.auth).send({ name: 'Empty', source: { kind: 'geojson', geojson: far } }).expect(201)).body as RegionSetView;
    const none = await request(t.url).post(`/api/groups/${groupId}/regional-budgets`).set(u.auth).send({ ...body, regionSetId: empty.id }).expect(400);
    expect(none.body.message).toMatch(/region "nowhere" .* holds no ocean cell/);

    const missing = await request(t.url).post(`/api/groups/${groupId}/regional-budgets`).set(u.auth).send({ ...body, regionSetId: boxes.id, terms: [{ variable: 'no_such', role: 'tendency' }] });
    expect(missing.status).toBe(422);
    await request(t.url).post(`/api/groups/${groupId}/regional-budgets`).set(u.auth).send({ ...body, terms: [{ variable: 'dic_adv', role: 'advection' }] }).expect(400); // no tendency
    const noFlags = await request(t.url).post(`/api/groups/${groupId}/region-sets`).set(u.auth).send({ name: 'x', source: { kind: 'mask', uploadId: budgetUpload, variable: 'deptho' } }).expect(400);
    expect(noFlags.body.message).toMatch(/no flag_values/);
    expect(await seriesCount()).toBe(before);
  });

  it('offers the standard boxes by their published names', async () => {
    const boxes = (await request(t.url).post(`/api/groups/${groupId}/region-sets`).set(u.auth).send({ name: 'Niño boxes', source: { kind: 'standard-boxes', boxIds: ['nino3'] } }).expect(201)).body as RegionSetView;
    expect(boxes.versions[0].regions[0].name).toBe('Niño 3');
  });
});
