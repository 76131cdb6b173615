import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openNetcdf, readMonthlyTime } from '../src/series/netcdf';
import { midMonthDays, NC_FILL_FLOAT, writeFieldNetcdf4, type FieldFileDescription } from '@upwell/demo-generator';

let dir: string;
// netCDF-C's own ncdump (Debian netcdf-bin) as a second opinion, where it is installed.
const ncdump = (() => {
  try {
    execFileSync('ncdump', [], { stdio: 'ignore' });
    return true;
  } catch (error) {
    return (error as { code?: string }).code !== 'ENOENT';
  }
})();
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'upwell-nc4-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

// v = 100·t + 10·j + i, exact in float32.
const field = { lat: [-1, 1], lon: [200, 202, 204], months: 14, values: Float32Array.from({ length: 14 * 2 * 3 }, (_, k) => 100 * Math.floor(k / 6) + 10 * (Math.floor(k / 3) % 2) + (k % 3)) };
const description: FieldFileDescription = { variable: 'x', longName: 'Test field', units: 'umol kg-1', startYear: 1980, global: { title: 't', source: 'synthetic' }, stampedAt: new Date('2026-01-15T00:00:00Z') };

describe('midMonthDays()', () => {
  it('puts January 1980 at day 15.5 and February 1980 (a leap year) at 31 + 14.5 = 45.5 days since 1980-01-01 (standard calendar)', () => {
    expect(Array.from(midMonthDays(1980, 3))).toEqual([15.5, 45.5, 75.5]);
  });
});

describe('writeFieldNetcdf4()', () => {
  it('round-trips through the project NetCDF reader: dims, values, CF time and fill value', async () => {
    const path = join(dir, 'small.nc');
    await writeFieldNetcdf4(path, field, description);
    const f = await openNetcdf(path);
    try {
      expect(f.dimensions).toEqual([
        { name: 'time', size: 14, unlimited: false },
        { name: 'nv', size: 2, unlimited: false },
        { name: 'lat', size: 2, unlimited: false },
        { name: 'lon', size: 3, unlimited: false },
      ]);
      expect(f.variables.map((v) => `${v.name}(${v.dims.join(',')})`)).toEqual(['time(time)', 'time_bnds(time,nv)', 'lat(lat)', 'lon(lon)', 'x(time,lat,lon)']);
      expect(Array.from(f.read('x'))).toEqual(Array.from(field.values));
      expect(Array.from(f.read('x', { start: [13, 1, 2], count: [1, 1, 1] }))).toEqual([1312]);
      expect(f.variable('x').attributes._FillValue).toBeCloseTo(NC_FILL_FLOAT, -30);
      const time = readMonthlyTime(f, 'time');
      expect([time.axis.start, time.axis.length]).toEqual(['1980-01', 14]);
    } finally {
      f.close();
    }
  });

  it('writes the same bytes twice, though HDF5 stamps object times (they come from stampedAt)', async () => {
    const a = join(dir, 'a.nc');
    const b = join(dir, 'b.nc');
    await writeFieldNetcdf4(a, field, description);
    await new Promise((r) => setTimeout(r, 1100)); // across a clock second
    await writeFieldNetcdf4(b, field, description);
    const hash = async (p: string) => createHash('sha256').update(await readFile(p)).digest('hex');
    expect(await hash(b)).toBe(await hash(a));
    await writeFieldNetcdf4(b, field, { ...description, stampedAt: new Date('2026-03-02T00:00:00Z') });
    expect(await hash(b)).not.toBe(await hash(a));
  });

  it('restores Date.now afterwards', async () => {
    await writeFieldNetcdf4(join(dir, 'c.nc'), field, description);
    expect(Math.abs(Date.now() - new Date().getTime())).toBeLessThan(1000);
    expect(Date.now()).toBeGreaterThan(new Date('2026-01-16T00:00:00Z').getTime());
  });

  it.skipIf(!ncdump)('is read by netCDF-C (ncdump -h): netCDF-4, dimensions, variable and char attributes', async () => {
    const path = join(dir, 'ncdump.nc');
    await writeFieldNetcdf4(path, field, description);
    expect(execFileSync('ncdump', ['-k', path], { encoding: 'utf8' }).trim()).toBe('netCDF-4');
    const header = execFileSync('ncdump', ['-h', path], { encoding: 'utf8' });
    expect(header).toMatch(/time = 14 ;\s+nv = 2 ;\s+lat = 2 ;\s+lon = 3 ;/);
    expect(header).not.toMatch(/ nv\(nv\)/); // a dimension without a variable, as netCDF-C writes it
    expect(header).toContain('double time_bnds(time, nv) ;');
    expect(header).toContain('float x(time, lat, lon) ;');
    expect(header).toContain('time:units = "days since 1980-01-01" ;');
    expect(header).toContain(':Conventions = "CF-1.8" ;');
    expect(header).toContain('x:_FillValue = 9.96921e+36f ;');
  });
});
