import { describe, expect, it } from 'vitest';
import { runNetcdfBench } from './netcdf';

describe('runNetcdfBench() on a small grid (timings are printed, never asserted)', () => {
  it('writes a NetCDF-4 file with h5wasm that the reader opens and reduces correctly', async () => {
    const figures = await runNetcdfBench({ months: 3, nlat: 18, nlon: 36 });
    // The bench field is 20 + 10 cos(lat) + sin(2πm/12); the first row (lat −85°) has no land,
    // so its zonal mean in month 1 is 20 + 10 cos 85°, stored as float32.
    expect(figures.checks.zonalFirstRowMonth1!).toBeCloseTo(Math.fround(20 + 10 * Math.cos((85 * Math.PI) / 180)), 5);
    expect(figures.dataMB).toBeCloseTo((3 * 18 * 36 * 4) / 1e6, 12);
    for (const key of ['readMBps', 'globalBoxMeanSeconds', 'zonalMeanSeconds'] as const) expect(Number.isFinite(figures[key])).toBe(true);
  });
});
