import { mkdtempSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { writeCraftedClassic, writeCraftedField } from '../../../test/crafted-netcdf';
import { loadH5wasm } from './load-esm';
import { NetcdfImportError } from './netcdf-import-error';
import { openNetcdf } from './open-netcdf';
import { reduceBox } from './reduce-box';

// Crafted files (made here, never committed): sizes declared in the header that the bytes cannot
// back, checked before anything of the declared size is allocated or read. Layouts from the NetCDF
// classic format specification (Unidata) and the HDF5 file format; see server/test/crafted-netcdf.ts.
const dir = mkdtempSync(join(tmpdir(), 'upwell-declared-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function failure(path: string, options?: Parameters<typeof openNetcdf>[1]): Promise<NetcdfImportError> {
  const error = await openNetcdf(path, options).then((f) => (f.close(), null), (e: unknown) => e);
  expect(error).toBeInstanceOf(NetcdfImportError);
  return error as NetcdfImportError;
}

describe('declared sizes a file cannot back', () => {
  it('refuses "CDF\\x01" followed by 100 zero bytes (a header with every list ABSENT) as holding no variables', async () => {
    const path = join(dir, 'zeros.nc');
    writeFileSync(path, Buffer.concat([Buffer.from('CDF\x01', 'latin1'), Buffer.alloc(100)]));
    const e = await failure(path);
    expect(e.code).toBe('not-importable');
    expect(e.message).toMatch(/declares no variables/);
  });

  it('refuses a 1.5 GiB file of "CDF\\x01" and zeros after reading only its header (the file is a sparse hole)', async () => {
    const path = join(dir, 'zeros-1.5GiB.nc');
    writeFileSync(path, Buffer.from('CDF\x01', 'latin1'));
    truncateSync(path, 1.5 * 1024 ** 3);
    const started = Date.now();
    const e = await failure(path);
    expect(e.code).toBe('not-importable');
    // Liveness bound, not a speed figure: reading 1.5 GiB would take far longer than this on any disk.
    expect(Date.now() - started).toBeLessThan(5000);
  });

  it('refuses a header declaring 1.5 GiB of data in a 70 kB file, naming the variable', async () => {
    const path = join(dir, 'declares-1.5GiB.nc');
    const { declaredBytes } = writeCraftedField(path, 24, 4096, 4096, 70_000); // coordinates written, the field not
    expect(declaredBytes).toBeGreaterThan(1.5 * 1024 ** 3);
    const e = await failure(path);
    expect(e.code).toBe('truncated');
    expect(e.where).toBe('dic');
    expect(e.message).toMatch(/the file has 70000 bytes/);
  });

  it('refuses a variable with more cells than the configured limit before reading it', async () => {
    const path = join(dir, 'real-but-big.nc');
    writeCraftedField(path, 2, 100, 200); // 40 000 cells, written in full (sparse zeros)
    const e = await failure(path, { limits: { maxCells: 39_999, maxReadCells: 2 ** 23 } });
    expect(e.code).toBe('too-large');
    expect(e.message).toMatch(/NETCDF_MAX_CELLS/);
  });

  it('refuses a box whose plane is beyond the read limit with a NetcdfImportError, not a RangeError', async () => {
    const path = join(dir, 'wide.nc');
    writeCraftedField(path, 2, 100, 200);
    const file = await openNetcdf(path, { limits: { maxCells: 2 ** 32, maxReadCells: 5000 } });
    try {
      const run = () => reduceBox(file, 'dic', { box: { lat: [-90, 90], lon: [0, 360] }, maxPlaneCells: 5000 });
      expect(run).toThrow(NetcdfImportError);
      expect(run).toThrow(/100 latitude rows × 200 longitudes = 20000 cells/);
    } finally {
      file.close();
    }
  });

  it('refuses a NetCDF-4 file declaring dic(time = 1, lat = 100000, lon = 100000) in about a megabyte (beyond deflate’s 1032:1)', async () => {
    const path = join(dir, 'huge-netcdf4.nc');
    const h5 = await loadH5wasm();
    const file = new h5.File(path, 'w');
    try {
      const axis = (name: string, units: string) => {
        const d = file.create_dataset({ name, data: Float64Array.from({ length: 100_000 }, (_, i) => i * 0.0018), dtype: '<d' });
        d.make_scale(name);
        d.create_attribute('units', units, null, `S${units.length}`);
      };
      const time = file.create_dataset({ name: 'time', data: Float64Array.of(15), dtype: '<d' });
      time.make_scale('time');
      time.create_attribute('units', 'days since 2000-01-01', null, 'S21');
      axis('lat', 'degrees_north');
      axis('lon', 'degrees_east');
      // Created small, chunked and deflated, then grown: HDF5 allocates no chunk for the growth.
      const dic = file.create_dataset({ name: 'dic', data: new Float32Array(1), shape: [1, 1, 1], maxshape: [1, 100_000, 100_000], dtype: '<f', chunks: [1, 1000, 1000], compression: 'gzip' });
      dic.resize([1, 100_000, 100_000]);
      dic.attach_scale(0, 'time');
      dic.attach_scale(1, 'lat');
      dic.attach_scale(2, 'lon');
    } finally {
      file.close();
    }
    const e = await failure(path);
    expect(e.code).toBe('implausible-size');
    expect(e.where).toBe('dic');
    expect(e.message).toMatch(/declares 40000000000 bytes/);
  });

  it('still opens an honest crafted file and reduces its zeros to 0 with full coverage', async () => {
    const path = join(dir, 'honest.nc');
    writeCraftedClassic(path, { x: 3 }, [{ name: 'x', dims: ['x'], type: 'double', values: [1, 2, 3] }]);
    const file = await openNetcdf(path);
    expect(Array.from(file.read('x'))).toEqual([1, 2, 3]);
    file.close();
    writeCraftedField(join(dir, 'zeros-field.nc'), 3, 10, 20);
    const field = await openNetcdf(join(dir, 'zeros-field.nc'));
    const r = reduceBox(field, 'dic', { box: { lat: [-30, 30], lon: [0, 90] } });
    field.close();
    expect(r.values).toEqual([0, 0, 0]);
    expect(r.coverage).toEqual([1, 1, 1]);
  });
});
