import { describe, expect, it } from 'vitest';
import { fixture } from '../../../test/fixtures/netcdf/fixture-path';
import { importSeries } from './import-series';
import { NetcdfImportError } from './netcdf-import-error';
import { openNetcdf } from './open-netcdf';

async function importFrom(file: string, name: string, options = {}) {
  const f = await openNetcdf(fixture(file));
  try {
    return importSeries(f, name, options);
  } finally {
    f.close();
  }
}

describe('importSeries()', () => {
  it.each(['series-classic.nc', 'series-64bit.nc', 'series-netcdf4.nc'])('imports enso_index from %s as 24 months from 2000-01, month 6 null', async (file) => {
    const s = await importFrom(file, 'enso_index');
    expect(s.start).toBe('2000-01');
    expect(s.values).toHaveLength(24);
    // make-fixtures.py: value k = round(sin(2πk/12), 3) stored as float32, k = 5 written as _FillValue.
    s.values.forEach((x, k) => {
      if (k === 5) expect(x).toBeNull();
      else expect(x).toBeCloseTo(Math.fround(Math.round(Math.sin((2 * Math.PI * k) / 12) * 1000) / 1000), 12); // ±0 alike
    });
    expect([s.units, s.longName, s.missing]).toEqual(['K', 'fictional ENSO index', 1]);
    expect(s.notes).toContain('decoded with _FillValue -999');
  });

  it('imports the packed series as unpacked values with nulls (CF 1.11 §8.1, §2.5.1)', async () => {
    const s = await importFrom('packed-int16.nc', 'sst_packed');
    expect(s.start).toBe('2010-01');
    // stored 0, 100, -100, 2500 → 15, 16, 14, 40 (× 0.01 + 15, float32); fill, missing_value and out-of-range → null.
    expect(s.values.slice(0, 7)).toEqual([15, 16, 14, 40, null, null, null]);
    expect(s.missing).toBe(4);
  });

  it('fills a skipped month with null when allowGaps is set', async () => {
    const s = await importFrom('skipped-month.nc', 'enso_index', { allowGaps: true });
    expect(s.values).toEqual([0, 1, null, 2]);
    expect(s.gaps).toEqual(['2000-03']);
  });

  it('refuses a gridded variable, naming its dimensions', async () => {
    await expect(importFrom('field-sinlat.nc', 'sinlat')).rejects.toThrow(/sinlat has dimensions \(time, lat, lon\); a series needs exactly one dimension/);
  });

  it('refuses a variable without time', async () => {
    await expect(importFrom('no-time.nc', 'station_depth')).rejects.toThrow(NetcdfImportError);
    await expect(importFrom('no-time.nc', 'station_depth')).rejects.toThrow(/no time coordinate/);
  });

  it('passes on the time error of a non-monthly file', async () => {
    await expect(importFrom('non-monthly.nc', 'enso_index')).rejects.toThrow(/not monthly/);
  });
});
