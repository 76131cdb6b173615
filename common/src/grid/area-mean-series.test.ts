import { describe, expect, it } from 'vitest';
import { mulberry32 } from '../stats/prng';
import { areaWeightedMean } from './area-mean';
import { areaMeanSeries } from './area-mean-series';
import { cellAreas } from './cell-areas';

const nlat = 18;
const nlon = 36;
const areas = cellAreas(Array.from({ length: nlat + 1 }, (_, i) => -90 + 10 * i), Array.from({ length: nlon + 1 }, (_, i) => 10 * i));

function randomField(nt: number, seed: number, nanShare: number): Float32Array {
  const rng = mulberry32(seed);
  return Float32Array.from({ length: nt * nlat * nlon }, () => (rng() < nanShare ? NaN : 20 * rng() - 5));
}

describe('areaMeanSeries()', () => {
  it('equals areaWeightedMean() of each time step, with NaN cells skipped (Float32 field, relative 1e-12)', () => {
    const field = randomField(5, 1, 0.2);
    const series = areaMeanSeries(field, nlat, nlon, areas);
    for (let t = 0; t < 5; t++) {
      const step = field.subarray(t * nlat * nlon, (t + 1) * nlat * nlon);
      expect(Math.abs(series[t] - (areaWeightedMean(step, areas) as number))).toBeLessThan(1e-12 * Math.abs(series[t]));
    }
  });

  it('gives the same result on the masked path as on the row-weight path when the mask keeps everything', () => {
    const field = Float64Array.from(randomField(3, 2, 0.1));
    const a = areaMeanSeries(field, nlat, nlon, areas);
    const b = areaMeanSeries(field, nlat, nlon, areas, new Uint8Array(nlat * nlon).fill(1));
    for (let t = 0; t < 3; t++) expect(b[t]).toBeCloseTo(a[t], 12);
  });

  it('honours a mask and is NaN for a step with no present cell', () => {
    const field = new Float64Array(2 * nlat * nlon).fill(NaN);
    for (let k = 0; k < nlat * nlon; k++) field[k] = k < nlon ? 7 : 1;
    const mask = Array.from({ length: nlat * nlon }, (_, k) => k < nlon);
    const s = areaMeanSeries(field, nlat, nlon, areas, mask);
    expect(s[0]).toBe(7);
    expect(s[1]).toBeNaN();
  });

  it('rejects a field whose size does not fit the grid', () => {
    expect(() => areaMeanSeries(new Float32Array(10), nlat, nlon, areas)).toThrow(RangeError);
  });
});
