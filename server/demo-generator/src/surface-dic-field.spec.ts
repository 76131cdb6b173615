import { describe, expect, it } from 'vitest';
import { createRandomStream } from './random-stream';
import { DEMO_FIELD, DEMO_GRID, surfaceDicField } from './surface-dic-field';

const months = 120;
const nLat = DEMO_GRID.lat.length;
const nLon = DEMO_GRID.lon.length;

/** Zonal mean of month t at latitude row j. */
function zonal(values: Float32Array, t: number, j: number): number {
  let s = 0;
  for (let i = 0; i < nLon; i++) s += values[(t * nLat + j) * nLon + i];
  return s / nLon;
}

describe('surfaceDicField()', () => {
  it('covers 20°S–20°N and 120°E–120°W on a 2° grid', () => {
    expect(DEMO_GRID.lat[0] - 1).toBe(-20);
    expect(DEMO_GRID.lat[nLat - 1] + 1).toBe(20);
    expect([DEMO_GRID.lon[0] - 1, DEMO_GRID.lon[nLon - 1] + 1]).toEqual([120, 240]);
  });

  it('puts a warm pulse at the equator first and later poleward, the delay growing with |lat|', () => {
    const pulse = new Float64Array(months);
    for (let t = 40; t < 46; t++) pulse[t] = 2;
    const quiet = surfaceDicField(createRandomStream(4), new Float64Array(months), { ...DEMO_FIELD, noise: 0 });
    const hit = surfaceDicField(createRandomStream(4), pulse, { ...DEMO_FIELD, noise: 0 });
    const onset = (j: number) => {
      for (let t = 0; t < months; t++) if (zonal(hit.values, t, j) - zonal(quiet.values, t, j) < -1) return t;
      return Infinity;
    };
    const equator = DEMO_GRID.lat.indexOf(1);
    const mid = DEMO_GRID.lat.indexOf(9);
    const far = DEMO_GRID.lat.indexOf(17);
    expect(onset(equator)).toBe(40);
    expect(onset(mid)).toBeGreaterThan(onset(equator));
    expect(onset(far)).toBeGreaterThan(onset(mid));
    // Warm events bring less DIC up: the anomaly is negative.
    expect(zonal(hit.values, 42, equator)).toBeLessThan(zonal(quiet.values, 42, equator));
  });

  it('has its DIC maximum in the equatorial upwelling band and plausible surface values (≈ 1950–2100 µmol/kg, common practice)', () => {
    const f = surfaceDicField(createRandomStream(4), new Float64Array(months));
    const equator = zonal(f.values, 0, DEMO_GRID.lat.indexOf(1));
    const edge = zonal(f.values, 0, 0);
    expect(equator).toBeGreaterThan(edge + 10);
    for (const v of f.values) {
      expect(v).toBeGreaterThan(1950);
      expect(v).toBeLessThan(2100);
    }
  });
});
