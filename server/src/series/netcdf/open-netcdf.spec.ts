import { afterEach, describe, expect, it } from 'vitest';
import { fixture } from '../../../test/fixtures/netcdf/fixture-path';
import { NetcdfImportError } from './netcdf-import-error';
import { openNetcdf } from './open-netcdf';
import type { NetcdfFile } from './types';

const opened: NetcdfFile[] = [];
async function open(name: string): Promise<NetcdfFile> {
  const f = await openNetcdf(fixture(name));
  opened.push(f);
  return f;
}
afterEach(() => {
  while (opened.length) opened.pop()!.close();
});

async function failure(name: string): Promise<NetcdfImportError> {
  try {
    (await openNetcdf(fixture(name))).close();
  } catch (error) {
    expect(error).toBeInstanceOf(NetcdfImportError);
    return error as NetcdfImportError;
  }
  throw new Error(`${name} opened, but it should not have`);
}

describe('openNetcdf()', () => {
  it.each([
    ['series-classic.nc', 'classic'],
    ['series-64bit.nc', '64bit-offset'],
    ['series-netcdf4.nc', 'netcdf4'],
  ])('opens %s by its magic bytes as %s, with the same dimensions, variables and attributes', async (name, format) => {
    const f = await open(name);
    expect(f.format).toBe(format);
    expect(f.dimensions).toEqual([
      { name: 'time', size: 24, unlimited: true },
      { name: 'nv', size: 2, unlimited: false },
    ]);
    expect(f.variables.map((v) => `${v.name}(${v.dims.join(',')}) ${v.dtype}`)).toEqual([
      'time(time) float64',
      'time_bnds(time,nv) float64',
      'enso_index(time) float32',
      'dic_inventory(time) float64',
    ]);
    expect(f.variable('enso_index').attributes).toEqual({ _FillValue: -999, units: 'K', long_name: 'fictional ENSO index' });
    expect(f.globalAttributes.Conventions).toBe('CF-1.11');
    // make-fixtures.py: dic_inventory = 38000 + k, k = 0..23.
    expect(Array.from(f.read('dic_inventory'))).toEqual(Array.from({ length: 24 }, (_, k) => 38000 + k));
  });

  it('reads the same bounds from a record variable in classic and NetCDF-4 files (first bound 2000-01-01 = 18262 days since 1950-01-01, cftime 1.6.2 in common/test-fixtures/check-values.json)', async () => {
    const classic = await open('series-classic.nc');
    const nc4 = await open('series-netcdf4.nc');
    expect(Array.from(classic.read('time_bnds'))).toEqual(Array.from(nc4.read('time_bnds')));
    expect(classic.read('time_bnds')[0]).toBe(18262);
  });

  it.each(['field-descending.nc', 'field-sinlat.nc'])('reads a hyperslab of %s equal to the same part of a full read', async (name) => {
    const f = await open(name);
    const v = f.variables.find((x) => x.dims.length === 3)!;
    const [nt, ny, nx] = v.shape;
    const all = f.read(v.name);
    const slab = f.read(v.name, { start: [1, 2, 3], count: [1, 4, 5] });
    const expected: number[] = [];
    for (let j = 2; j < 6; j++) for (let i = 3; i < 8; i++) expected.push(all[1 * ny * nx + j * nx + i]);
    expect(Array.from(slab)).toEqual(expected);
    expect(nt).toBeGreaterThan(1);
  });

  it('refuses a hyperslab outside the variable, naming the dimension', async () => {
    const f = await open('series-classic.nc');
    expect(() => f.read('enso_index', { start: [20], count: [5] })).toThrow(/start 20, count 5 is outside dimension time of enso_index \(length 24\)/);
    expect(() => f.read('enso_index', { start: [0, 0], count: [1, 1] })).toThrow(/needs 1 start and count values/);
  });

  it('names the variables there are when asked for one that is not', async () => {
    const f = await open('series-netcdf4.nc');
    expect(() => f.variable('sst')).toThrow(/no variable "sst" in the file; it has time, time_bnds, enso_index, dic_inventory/);
  });

  it('refuses an empty file', async () => {
    const e = await failure('empty.nc');
    expect([e.code, e.where, e.message]).toEqual(['not-netcdf', 'byte 0', 'the file is empty']);
  });

  it('refuses a file with the wrong magic bytes and shows what it starts with', async () => {
    const e = await failure('wrong-magic.nc');
    expect(e.code).toBe('not-netcdf');
    expect(e.message).toMatch(/starts with "time,ens", expected "CDF\\x01"/);
  });

  it('refuses a classic file truncated in its data, naming the variable that does not fit', async () => {
    const e = await failure('truncated-classic.nc');
    expect(e.code).toBe('truncated');
    expect(e.where).toBe('time');
    expect(e.message).toMatch(/the file has 1328 bytes/);
  });

  it('refuses a classic file truncated inside its header', async () => {
    const e = await failure('truncated-classic-header.nc');
    expect(e.code).toBe('truncated');
    expect(e.message).toMatch(/header ends before its declared content \(file is 40 bytes\)/);
  });

  it('refuses a header claiming more data than the file holds (dimension of 2^30 in a 108-byte file)', async () => {
    const e = await failure('huge-dimension.nc');
    expect(e.code).toBe('truncated');
    expect(e.where).toBe('x');
    expect(e.message).toMatch(/big=1073741824/);
  });

  it('refuses a truncated NetCDF-4 file from its superblock end-of-file address (HDF5 format spec §II.A)', async () => {
    const e = await failure('truncated-hdf5.nc');
    expect(e.code).toBe('truncated');
    expect(e.message).toMatch(/superblock says it ends at byte 24995, but it has 12497 bytes/);
  });

  it('refuses an HDF5 file that is not NetCDF-4 and lists what it holds', async () => {
    const e = await failure('not-netcdf.h5');
    expect(e.code).toBe('not-netcdf');
    expect(e.message).toMatch(/no dimension scales.*datasets: data; groups: meta/);
  });
});
