import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fixture } from '../../../test/fixtures/netcdf/fixture-path';
import { openNetcdf } from './open-netcdf';
import type { NetcdfFile } from './types';
import { zonalMeanField } from './zonal-mean-field';

const DEG = Math.PI / 180;
let sinlat: NetcdfFile;
let descending: NetcdfFile;
let depth: NetcdfFile;
beforeAll(async () => {
  sinlat = await openNetcdf(fixture('field-sinlat.nc'));
  descending = await openNetcdf(fixture('field-descending.nc'));
  depth = await openNetcdf(fixture('field-depth.nc'));
});
afterAll(() => {
  sinlat.close();
  descending.close();
  depth.close();
});

describe('zonalMeanField()', () => {
  it('gives a time × latitude field: rows of sin(lat) are sin of their centre (field constant along longitude)', () => {
    const z = zonalMeanField(sinlat, 'sinlat', { lon: [90, 130], lat: [0, 3] });
    expect(z.start).toBe('2000-01');
    expect(z.lat).toEqual([0.5, 1.5, 2.5]);
    expect(z.values).toHaveLength(3);
    z.lat.forEach((lat, r) => {
      expect(z.values[0][r]!).toBeCloseTo(Math.sin(lat * DEG), 7); // float32 storage
      expect(z.values[1][r]!).toBeCloseTo(2 * Math.sin(lat * DEG), 7);
      // Month 3 has lon 100–120 masked: the rest of the band still averages to sin(lat).
      expect(z.values[2][r]!).toBeCloseTo(Math.sin(lat * DEG), 7);
    });
  });

  it('leaves a row null when the whole band is missing', () => {
    const z = zonalMeanField(sinlat, 'sinlat', { lon: [101, 119], lat: [0, 1] });
    expect(z.values[2]).toEqual([null]);
    expect(z.values[0][0]!).toBeCloseTo(Math.sin(0.5 * DEG), 7);
  });

  it('handles a band crossing ±180°: lonfield over 170°E → 160°W is (175 − 175 − 165)/3 = −55 in every row', () => {
    const z = zonalMeanField(descending, 'lonfield', { lon: [170, -160] });
    expect(z.lat).toHaveLength(18);
    for (const v of z.values[0]) expect(v!).toBeCloseTo(-55, 5);
  });

  it('averages a depth range with thickness weights: dic over 0–20 m is (10·5 + 10·20)/20 = 12.5 in every row', () => {
    const z = zonalMeanField(depth, 'dic', { lon: [0, 360], depth: [0, 20] });
    for (const v of z.values[0]) expect(v!).toBeCloseTo(12.5, 9);
    expect(z.provenance.method).toBe('zonal mean');
  });
});
