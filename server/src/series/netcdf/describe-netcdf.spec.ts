import { describe, expect, it } from 'vitest';
import { fixture } from '../../../test/fixtures/netcdf/fixture-path';
import { describeNetcdf } from './describe-netcdf';
import { openNetcdf } from './open-netcdf';

async function describeFile(name: string) {
  const f = await openNetcdf(fixture(name));
  try {
    return describeNetcdf(f);
  } finally {
    f.close();
  }
}

describe('describeNetcdf()', () => {
  it('lists 1-D time variables as series with units, names, months and missing count', async () => {
    const d = await describeFile('series-netcdf4.nc');
    expect(d.time).toEqual({ variable: 'time', units: 'days since 1950-01-01', start: '2000-01', end: '2001-12', months: 24, calendar: 'standard', fromBounds: true, stampedAtMonthStarts: false });
    const byName = Object.fromEntries(d.candidates.map((c) => [c.name, c]));
    expect(byName.enso_index).toMatchObject({ kind: 'series', units: 'K', longName: 'fictional ENSO index', start: '2000-01', end: '2001-12', months: 24, missing: 1 });
    expect(byName.dic_inventory).toMatchObject({ kind: 'series', units: 'PgC', standardName: 'ocean_mass_content_of_dissolved_inorganic_carbon', missing: 0 });
    expect(byName.time).toMatchObject({ kind: 'not-importable', role: 'coordinate', reason: 'time is the time coordinate' });
    expect(byName.time_bnds).toMatchObject({ kind: 'not-importable', role: 'bounds', reason: 'time_bnds holds the cell bounds of time' });
  });

  it('lists (time, lat, lon) and (time, depth, lat, lon) variables as fields, and cell measures as structure', async () => {
    const sinlat = await describeFile('field-sinlat.nc');
    const kinds = Object.fromEntries(sinlat.candidates.map((c) => [c.name, c.kind === 'field' ? c.layout : c.kind]));
    expect(kinds).toMatchObject({ sinlat: 'time-lat-lon', ones: 'time-lat-lon', areacello: 'not-importable', lat_bnds: 'not-importable' });
    expect(sinlat.candidates.find((c) => c.name === 'areacello')).toMatchObject({ role: 'cell-measure', reason: 'areacello is the cell area of ones' });
    const depth = await describeFile('field-depth.nc');
    expect(depth.candidates.find((c) => c.name === 'dic')).toMatchObject({ kind: 'field', layout: 'time-depth-lat-lon', start: '2005-06', months: 2 });
  });

  it('says why variables without a time dimension cannot be imported', async () => {
    const d = await describeFile('no-time.nc');
    const reasons = Object.fromEntries(d.candidates.map((c) => [c.name, c.kind === 'not-importable' ? c.reason : c.kind]));
    expect(reasons.bathymetry).toBe('variable bathymetry has no time dimension (dimensions: lat, lon)');
    expect(reasons.station_depth).toBe('variable station_depth has no time dimension (dimensions: station)');
    expect(d.time).toEqual({ problem: expect.stringMatching(/no time coordinate/) });
  });

  it('gives the time problem as the reason instead of throwing', async () => {
    const d = await describeFile('duplicated-month.nc');
    const c = d.candidates.find((x) => x.name === 'enso_index')!;
    expect(c.kind).toBe('not-importable');
    expect(c.kind === 'not-importable' && c.reason).toMatch(/same month 2000-02/);
  });

  it('passes on notes about coordinates found by name only', async () => {
    const d = await describeFile('field-bare-names.nc');
    expect(d.notes).toHaveLength(2);
    expect(d.candidates.find((c) => c.name === 'x')?.kind).toBe('field');
  });
});
