import { describe, expect, it } from 'vitest';
import { zonalMean } from './zonal-mean';

const lonEdges = Array.from({ length: 37 }, (_, i) => 10 * i); // centres 5, 15, …, 355
const nlat = 2;

/** A (time = 2, lat = 2, lon = 36) field whose value is the cell-centre longitude (+1000 at t = 1). */
function lonField(): Float64Array {
  const f = new Float64Array(2 * nlat * 36);
  for (let t = 0; t < 2; t++) for (let i = 0; i < nlat; i++) for (let j = 0; j < 36; j++) f[(t * nlat + i) * 36 + j] = 5 + 10 * j + 1000 * t;
  return f;
}

describe('zonalMean()', () => {
  it('averages the cells whose centres lie in the band, giving time × lat', () => {
    const z = zonalMean(lonField(), nlat, lonEdges, { from: 120, to: 170 });
    // Centres 125..165: mean 145.
    expect(Array.from(z)).toEqual([145, 145, 1145, 1145]);
  });

  it('crosses the antimeridian when the band is given as 160 to −80 (160°E–280°E)', () => {
    const z = zonalMean(lonField(), nlat, lonEdges, { from: 160, to: -80 });
    // Centres 165..275: mean 220.
    expect(z[0]).toBe(220);
  });

  it('skips NaN cells and is NaN for a row without present cells in the band', () => {
    const f = lonField();
    f[12] = NaN; // centre 125 of row 0, t = 0
    for (let j = 0; j < 36; j++) f[36 + j] = NaN; // all of row 1, t = 0
    const z = zonalMean(f, nlat, lonEdges, { from: 120, to: 170 });
    expect(z[0]).toBe(150);
    expect(z[1]).toBeNaN();
  });
});
