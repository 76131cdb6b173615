import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ImportUploadResponse, ReduceFieldResponse, UploadPreview, ZonalMeanFieldView } from '@upwell/common';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildUser, type TestUser } from './factories';

const NC = join(__dirname, 'fixtures', 'netcdf');

describe('NetCDF uploads, fields and reductions over HTTP', () => {
  let t: TestApp;
  let u: TestUser;
  let groupId: string;
  beforeAll(async () => {
    t = await startTestApp();
    u = await buildUser(t.url);
    groupId = (await buildGroup(t.url, u)).id;
  });
  afterAll(() => t.close());

  const upload = (file: string) => request(t.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', join(NC, file));
  const values = async (id: string) => (await request(t.url).get(`/api/series/${id}/versions/latest/values`).set(u.auth).expect(200)).body;

  for (const [file, format] of [['series-classic.nc', 'netcdf-classic'], ['series-64bit.nc', 'netcdf-classic'], ['series-netcdf4.nc', 'netcdf4']] as const) {
    it(`imports the 1-D variables of ${file} as monthly series`, async () => {
      const preview = (await upload(file).expect(201)).body as UploadPreview;
      expect(preview.format).toBe(format);
      const byName = Object.fromEntries(preview.netcdf!.variables.map((v) => [v.name, v]));
      expect(byName.enso_index).toMatchObject({ use: 'series', start: '2000-01', months: 24, missing: 1, units: 'K' });
      expect(byName.dic_inventory).toMatchObject({ use: 'series', units: 'PgC' });
      const imported = (
        await request(t.url)
          .post(`/api/uploads/${preview.uploadId}/import`)
          .set(u.auth)
          .send({ origin: 'model-output', columns: [{ column: 'enso_index', skip: false, name: `index from ${file}`, kind: 'climate-index', variable: 'enso_index', units: '' }] })
          .expect(200)
      ).body as ImportUploadResponse;
      const v = await values(imported.series[0].id);
      // The fixture script writes round(sin(2πk/12), 3) with month k = 5 masked (make-fixtures.py, series_file).
      expect(v.start).toBe('2000-01');
      expect(v.values).toHaveLength(24);
      expect(v.values[5]).toBeNull();
      for (const k of [0, 1, 3, 9, 23]) expect(v.values[k]).toBeCloseTo(Math.round(Math.sin((2 * Math.PI * k) / 12) * 1000) / 1000, 6);
      expect(v.units).toBe('K');
      const detail = (await request(t.url).get(`/api/series/${imported.series[0].id}`).set(u.auth).expect(200)).body;
      expect(detail.versions[0].transform).toEqual({ type: 'netcdf-variable', variable: 'enso_index' });
    });
  }

  it('keeps a gridded field and reduces it: the band mean of sin(latitude) matches the analytical value', async () => {
    const preview = (await upload('field-sinlat.nc').expect(201)).body as UploadPreview;
    const grid = preview.netcdf!.variables.find((v) => v.name === 'sinlat')!;
    expect(grid).toMatchObject({ use: 'grid', dims: ['time', 'lat', 'lon'], shape: [3, 180, 360] });
    const imported = (await request(t.url).post(`/api/uploads/${preview.uploadId}/import`).set(u.auth).send({ grids: [{ variable: 'sinlat', name: 'sine of latitude' }] }).expect(200)).body as ImportUploadResponse;
    expect(imported.fields).toHaveLength(1);
    const fields = (await request(t.url).get(`/api/groups/${groupId}/fields`).set(u.auth).expect(200)).body;
    expect(fields.gridded[0]).toMatchObject({ variable: 'sinlat', start: '2000-01', extent: [-89.5, 89.5, 0.5, 359.5] });

    // Area-weighted mean of sin φ over [φ1, φ2] on a sphere: ∫ sin φ cos φ dφ / ∫ cos φ dφ = (sin φ1 + sin φ2)/2
    // (analytical identity); for 0–30°N that is 0.25. Cell-centre sampling on a 1° grid differs by O(1e-5).
    const box = (await request(t.url).post(`/api/fields/${imported.fields[0].id}/reductions`).set(u.auth).send({ kind: 'box-mean', name: 'Band mean 0–30N', lat: [0, 30], lon: [0, 360] }).expect(200)).body as ReduceFieldResponse;
    const v = await values(box.series!.id);
    expect(v.start).toBe('2000-01');
    expect(v.values[0]).toBeCloseTo(0.25, 4);
    expect(v.values[1]).toBeCloseTo(0.5, 4);
    // Month 3 has the 100–120°E cells missing; the mean renormalises over what is present (sin φ does not vary with longitude).
    expect(v.values[2]).toBeCloseTo(0.25, 4);
    const detail = (await request(t.url).get(`/api/series/${box.series!.id}`).set(u.auth).expect(200)).body;
    expect(detail).toMatchObject({ origin: 'derived' });
    expect(detail.versions[0].transform.type).toBe('grid-reduction');

    const zonal = (await request(t.url).post(`/api/fields/${imported.fields[0].id}/reductions`).set(u.auth).send({ kind: 'zonal-mean', name: 'Zonal mean, all longitudes', lon: [0, 360] }).expect(200)).body as ReduceFieldResponse;
    const field = (await request(t.url).get(`/api/zonal-fields/${zonal.zonal!.id}`).set(u.auth).expect(200)).body as ZonalMeanFieldView;
    expect(field.months).toBe(3);
    expect(field.latitudes).toHaveLength(180);
    const row = field.latitudes.indexOf(30.5);
    expect(field.values![0][row]).toBeCloseTo(Math.sin((30.5 * Math.PI) / 180), 5);
    expect(field.values![1][row]).toBeCloseTo(2 * Math.sin((30.5 * Math.PI) / 180), 5);
  });

  it('refuses a reduction with a bad box with 400', async () => {
    const fields = (await request(t.url).get(`/api/groups/${groupId}/fields`).set(u.auth).expect(200)).body;
    const id = fields.gridded[0].id;
    const res = await request(t.url).post(`/api/fields/${id}/reductions`).set(u.auth).send({ kind: 'box-mean', name: 'x', lat: [30, 0], lon: [0, 10] }).expect(400);
    expect(res.body.message).toContain('south');
  });

  it('reads every calendar fixture into the same months as its stored check dates', async () => {
    for (const cal of ['standard', 'noleap', '360_day', 'all_leap', 'proleptic_gregorian', 'julian']) {
      const preview = (await upload(`calendar-${cal}.nc`).expect(201)).body as UploadPreview;
      expect(preview.netcdf!.calendar, cal).toBe(cal === 'standard' ? 'standard' : cal);
      expect(preview.netcdf!.variables.some((v) => v.use === 'series'), cal).toBe(true);
    }
  });

  it('shows the time units in the preview, and doubts a bounds-less axis stamped at 00:00 on the 1st of each month', async () => {
    const plain = (await upload('series-classic.nc').expect(201)).body as UploadPreview;
    // make-fixtures.py writes the series files with units "days since 1950-01-01", mid-month times and bounds.
    expect(plain.netcdf!.timeUnits).toBe('days since 1950-01-01');
    expect(plain.netcdf!.timeWarnings).toEqual([]);
    const starts = (await upload('month-start-stamps.nc').expect(201)).body as UploadPreview;
    expect(starts.netcdf!.timeUnits).toBe('days since 2000-01-01');
    expect(starts.netcdf!.timeWarnings).toHaveLength(1);
    expect(starts.netcdf!.timeWarnings[0]).toMatch(/first of a month.*no bounds.*shifted by one/);
  });

  it('stores the time axis calendar on the imported series version (noleap, 360_day, standard)', async () => {
    for (const cal of ['noleap', '360_day', 'standard']) {
      const preview = (await upload(`calendar-${cal}.nc`).expect(201)).body as UploadPreview;
      const variable = preview.netcdf!.variables.find((v) => v.use === 'series')!.name;
      const imported = (
        await request(t.url)
          .post(`/api/uploads/${preview.uploadId}/import`)
          .set(u.auth)
          .send({ origin: 'model-output', columns: [{ column: variable, skip: false, name: `calendar ${cal}`, kind: 'other', variable, units: '' }] })
          .expect(200)
      ).body as ImportUploadResponse;
      const detail = (await request(t.url).get(`/api/series/${imported.series[0].id}`).set(u.auth).expect(200)).body;
      expect(detail.versions[0].calendar, cal).toBe(cal);
    }
  });

  it('refuses broken or non-NetCDF files with a clear 4xx and stores nothing', async () => {
    const before = (await request(t.url).get(`/api/groups/${groupId}/series`).set(u.auth).expect(200)).body.total;
    for (const file of ['truncated-classic.nc', 'truncated-classic-header.nc', 'truncated-hdf5.nc', 'not-netcdf.h5', 'empty.nc', 'huge-dimension.nc']) {
      const res = await upload(file);
      expect(res.status, `${file}: ${JSON.stringify(res.body)}`).toBeGreaterThanOrEqual(400);
      expect(res.status, file).toBeLessThan(500);
      expect(res.body.message.length, file).toBeGreaterThan(10);
    }
    expect((await request(t.url).get(`/api/groups/${groupId}/series`).set(u.auth).expect(200)).body.total).toBe(before);
    expect(readdirSync(join(t.dataDir, 'uploads', 'tmp'))).toEqual([]);
    await request(t.url).get('/api/health').expect(200);
  });

  it('goes by a file’s content, not its name: a text table called .nc is read as CSV', async () => {
    const res = (await upload('wrong-magic.nc').expect(201)).body as UploadPreview;
    expect(res.format).toBe('csv');
  });

  it('says why a variable cannot be a series (no time, unknown calendar, units without "since", not monthly, duplicated month)', async () => {
    for (const file of ['no-time.nc', 'unknown-calendar.nc', 'units-no-since.nc', 'non-monthly.nc', 'duplicated-month.nc']) {
      const res = await upload(file);
      if (res.status >= 400) {
        expect(res.status, file).toBeLessThan(500);
        continue;
      }
      const preview = res.body as UploadPreview;
      const data = preview.netcdf!.variables.filter((v) => v.use !== 'series' && v.reason && !/coordinate|bounds/.test(v.reason));
      expect(data.length, file).toBeGreaterThan(0);
      const name = data[0].name;
      const imp = await request(t.url)
        .post(`/api/uploads/${preview.uploadId}/import`)
        .set(u.auth)
        .send({ columns: [{ column: name, skip: false, name: `bad ${file}`, kind: 'other', variable: name, units: '' }] });
      expect(imp.status, `${file}: ${JSON.stringify(imp.body)}`).toBeGreaterThanOrEqual(400);
      expect(imp.status, file).toBeLessThan(500);
    }
  });
});
