import { describe, expect, it } from 'vitest';
import { fixture } from '../../../test/fixtures/netcdf/fixture-path';
import { createCfDecoder, decodedCopy } from './cf-decoder';
import { openNetcdf } from './open-netcdf';
import type { NcVariable } from './types';

const variable = (dtype: NcVariable['dtype'], attributes: NcVariable['attributes']): NcVariable => ({ name: 'x', dims: ['time'], shape: [0], dtype, attributes });

describe('createCfDecoder()', () => {
  it('decodes the packed int16 fixture: fill, missing_value and valid_range on stored values, then × 0.01 + 15 (CF 1.11 §2.5.1, §8.1)', async () => {
    const f = await openNetcdf(fixture('packed-int16.nc'));
    const v = f.variable('sst_packed');
    const { values, missing } = decodedCopy(f.read(v.name), createCfDecoder(v));
    f.close();
    // Stored (make-fixtures.py): 0, 100, -100, 2500, -32767 fill, -32766 missing_value, 3500 > valid max,
    // 1234, -3000, 3000 (range ends, kept), -3001 < valid min, 7.
    const expected = [15, 16, 14, 40, NaN, NaN, NaN, 27.34, -15, 45, NaN, 15.07];
    expect(missing).toBe(4);
    values.forEach((x, i) => {
      if (Number.isNaN(expected[i])) expect(x).toBeNaN();
      else expect(x).toBeCloseTo(expected[i], 5); // float32 unpacking: ~1e-6 relative
    });
  });

  it('matches a float32 _FillValue stored as a double attribute by rounding it to float32', () => {
    const d = createCfDecoder(variable('float32', { _FillValue: 1e20 }));
    const out = new Float64Array(2);
    expect(d.decode(Float32Array.of(1e20, 3), out)).toBe(1);
    expect(out[0]).toBeNaN();
    expect(out[1]).toBe(3);
  });

  it('uses the NetCDF default fill value when there is no _FillValue (netcdf.h NC_FILL_FLOAT = 9.9692099683868690e+36)', () => {
    const out = new Float64Array(2);
    expect(createCfDecoder(variable('float32', {})).decode(Float32Array.of(9.969209968386869e36, 1), out)).toBe(1);
    expect(out[0]).toBeNaN();
  });

  it('assumes no default fill for bytes (NetCDF User Guide)', () => {
    const out = new Float64Array(1);
    expect(createCfDecoder(variable('int8', {})).decode(Int8Array.of(-127), out)).toBe(0);
    expect(out[0]).toBe(-127);
  });

  it('treats every value of a missing_value list as missing, and NaN as missing', () => {
    const out = new Float64Array(4);
    expect(createCfDecoder(variable('float64', { missing_value: [-1, -2] })).decode(Float64Array.of(-1, -2, NaN, 5), out)).toBe(3);
    expect(out[3]).toBe(5);
  });

  it('applies valid_min and valid_max alone', () => {
    const out = new Float64Array(3);
    expect(createCfDecoder(variable('float64', { valid_min: 0 })).decode(Float64Array.of(-1, 0, 1), out)).toBe(1);
    expect(createCfDecoder(variable('float64', { valid_max: 0 })).decode(Float64Array.of(-1, 0, 1), out)).toBe(1);
  });

  it('reads signed bytes as unsigned with _Unsigned = "true" (NetCDF User Guide): -1 → 255', () => {
    const out = new Float64Array(2);
    createCfDecoder(variable('int8', { _Unsigned: 'true' })).decode(Int8Array.of(-1, 5), out);
    expect(Array.from(out)).toEqual([255, 5]);
  });

  it('keeps double precision when scale/offset are not float32 values', () => {
    const out = new Float64Array(1);
    createCfDecoder(variable('int16', { scale_factor: 0.1, add_offset: 0 })).decode(Int16Array.of(3), out);
    expect(out[0]).toBe(3 * 0.1);
  });

  it('reports what it applies, for provenance', () => {
    expect(createCfDecoder(variable('int16', { _FillValue: -1, scale_factor: 0.5 })).steps).toEqual(['_FillValue -1', 'unpacked = stored × 0.5 + 0 (CF 1.11 §8.1), in float32']);
  });
});
