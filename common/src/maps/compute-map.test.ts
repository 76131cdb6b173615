import { describe, expect, it } from 'vitest';
import { mapsReference, referenceSource } from '../../test-fixtures/maps-reference';
import { anomaly } from '../series/anomaly';
import { formatMonth, parseMonth } from '../series/month';
import { ebisuzakiTest } from '../stats/ebisuzaki';
import { mulberry32 } from '../stats/prng';
import { computeMap } from './compute-map';
import type { MapRequest } from './map-types';
import { patternStatistics } from './pattern-statistics';

// Reference: common/test-fixtures/maps-reference.json, made by scripts/maps_reference.py with numpy and
// xarray (means, groupby climatology with the WMO 80 % rule, anomalies, region selection), scipy.stats
// (ttest_ind(equal_var=False), ttest_1samp, t.sf for the nEff t test) and statsmodels (multipletests fdr_bh),
// all in float64 from the same float32-rounded data. Tolerances: map values 1e-9 absolute (values ~20, so
// float64 sums in another order differ by ~1e-13); p-values 1e-9 absolute (the engine's incomplete beta
// against scipy's); nEff 1e-9.
const ref = mapsReference();
const expectClose = (actual: ArrayLike<number>, expected: (number | null)[], tol: number, what: string) => {
  expect(actual.length, what).toBe(expected.length);
  for (let i = 0; i < expected.length; i++) {
    const e = expected[i];
    if (e === null) expect(Number.isNaN(actual[i]), `${what}[${i}] should be missing`).toBe(true);
    else expect(Math.abs(actual[i] - e), `${what}[${i}]: ${actual[i]} vs ${e}`).toBeLessThanOrEqual(tol);
  }
};

function run(name: string) {
  const c = ref.cases.find((x) => x.name === name)!;
  const { source, lat, lon } = referenceSource(ref, c.lonConvention, c.request.region);
  const req = { ...(c.request as unknown as MapRequest), index: ref.index, events: ref.events };
  return { c, lat, lon, result: computeMap(source, req) };
}

describe('computeMap() against numpy/xarray/scipy/statsmodels (maps_reference.py)', () => {
  for (const c of ref.cases) {
    it(`${c.name}: values${c.p ? ', p' : ''}${c.fdr ? ', FDR' : ''} match`, () => {
      const { lat, lon, result } = run(c.name);
      expect(lat).toEqual(c.lat);
      expect(lon).toEqual(c.lon);
      expectClose(result.values, c.values, 1e-9, 'values');
      if (c.p) expectClose(result.p!, c.p, 1e-9, 'p');
      if (c.fdr) {
        expect(Array.from(result.significant!, (v) => v === 1)).toEqual(c.fdr.significant);
        expect(result.counts).toMatchObject({ tested: c.fdr.tested, significantPointwise: c.fdr.pointwise, significantFdr: c.fdr.fdr });
      }
      if (c.eventMonths !== undefined) expect(result.counts).toMatchObject({ eventMonths: c.eventMonths, neutralMonths: c.neutralMonths });
    });
  }

  it('reads a descending-latitude grid in storage order and a box across the antimeridian the same in both longitude conventions', () => {
    const a = run('mean DJF 2000-12..2009-02, box across the antimeridian, lon 180');
    const b = run('mean DJF 2000-12..2009-02, box across the antimeridian, lon 360');
    expect(a.lat).toEqual([15, 5, -5, -15]);
    expect(a.lon).toEqual([135, 165, 195, 225]);
    expect(Array.from(b.result.values)).toEqual(Array.from(a.result.values));
  });

  it('leaves a cell null in February when its February climatology fails the 80 % rule, and says so', () => {
    const { result } = run('anomaly at February 2004 (a cell fails the 80 % rule)');
    expect(Number.isNaN(result.values[2 * 12 + 7])).toBe(true);
    expect(result.warnings.join(' ')).toMatch(/climatology of Feb is null at 1 of/);
  });

  it('phase-randomised p of a cell equals the series engine’s Ebisuzaki test on that cell with the same seed (consistency with stats/ebisuzaki.ts)', () => {
    const base = { from: '2000-01', to: '2009-12' };
    const period = { from: '2008-01', to: '2009-12' }; // no missing month of the field inside
    const { source } = referenceSource(ref, 180);
    const map = computeMap(source, { mode: 'correlation', base, period, lag: 2, index: ref.index, significance: 'phase-randomised', surrogates: 200, seed: 7 });
    const cell = 30;
    // The cell's anomaly series, one anomaly-at map per month, and the index anomaly two months earlier.
    const y: number[] = [];
    for (let m = parseMonth(period.from); m <= parseMonth(period.to); m++) {
      y.push(computeMap(source, { mode: 'anomaly-at', base, period: { from: formatMonth(m), to: formatMonth(m) } }).values[cell]);
    }
    const ia = anomaly({ series: ref.index, base }).anomaly.values;
    const i0 = parseMonth(period.from) - 2 - parseMonth(ref.index.start);
    const x = ia.slice(i0, i0 + y.length) as number[];
    const expected = ebisuzakiTest(x, y, mulberry32(7), 200);
    expect(map.values[cell]).toBeCloseTo(expected.r!, 12);
    expect(map.p![cell]).toBe(expected.p);
    // The cell whose February climatology fails the 80 % rule has no anomaly in February: no phase-randomised p.
    expect(map.p!.filter((p) => p === p).length).toBe(69);
    expect(Number.isNaN(map.p![2 * 12 + 7])).toBe(true);
    expect(map.warnings.join(' ')).toMatch(/1 cells with missing months have no p/);
  });

  it('area-weighted pattern statistics of two fixture maps match numpy (np.average with cell-area weights)', () => {
    const a = run(ref.pattern.a).result.values;
    const b = run(ref.pattern.b).result.values;
    const s = patternStatistics(a, b, ref.pattern.weights);
    expect(s.cells).toBe(ref.pattern.cells);
    expect(s.correlation!).toBeCloseTo(ref.pattern.correlation, 12);
    expect(s.rmsDifference!).toBeCloseTo(ref.pattern.rmsDifference, 12);
    expect(s.centredRmsDifference!).toBeCloseTo(ref.pattern.centredRmsDifference, 12);
  });
});
