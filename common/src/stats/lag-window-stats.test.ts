import { describe, expect, it } from 'vitest';
import { sampleCorrelation } from 'simple-statistics';
import { lag1Autocorrelation } from './lag1-autocorrelation';
import { lagPrefixSums } from './lag-prefix-sums';
import { LAG_N, LAG_R, LAG_R1X, LAG_R1Y, lagWindowStats, lagWindowStatsComplete } from './lag-window-stats';
import { prepareForCorrelation } from './prepare-for-correlation';
import { mulberry32, normalVariate } from './prng';

function series(n: number, seed: number): Float64Array {
  const rng = mulberry32(seed);
  let a = 0;
  return Float64Array.from({ length: n }, () => (a = 0.6 * a + normalVariate(rng)) + 1e8);
}

describe('lagWindowStats() and lagWindowStatsComplete()', () => {
  const x = prepareForCorrelation(series(80, 1));
  const y = prepareForCorrelation(series(90, 2));

  it('agree with each other and with simple-statistics / NIST-form r1 on a gap-free window (1e8 offset removed by preparation)', () => {
    const a = new Float64Array(4);
    const b = new Float64Array(4);
    lagWindowStats(x, 5, y, 12, 60, a);
    lagWindowStatsComplete(x, lagPrefixSums(x), 5, y, lagPrefixSums(y), 12, 60, b);
    const wx = Array.from(x.subarray(5, 65));
    const wy = Array.from(y.subarray(12, 72));
    expect(a[LAG_N]).toBe(60);
    expect(b[LAG_N]).toBe(60);
    for (const out of [a, b]) {
      expect(Math.abs(out[LAG_R] - sampleCorrelation(wx, wy))).toBeLessThan(1e-12);
      expect(Math.abs(out[LAG_R1X] - (lag1Autocorrelation(wx) as number))).toBeLessThan(1e-12);
      expect(Math.abs(out[LAG_R1Y] - (lag1Autocorrelation(wy) as number))).toBeLessThan(1e-12);
    }
  });

  it('lagWindowStats skips incomplete pairs and breaks lag-1 products at gaps', () => {
    const gx = Float64Array.from(x);
    gx[20] = NaN;
    const out = new Float64Array(4);
    lagWindowStats(gx, 0, y, 0, 50, out);
    const px = Array.from(gx.subarray(0, 50), (v) => (Number.isNaN(v) ? null : v));
    const py = Array.from(y.subarray(0, 50), (v, i) => (i === 20 ? null : v));
    expect(out[LAG_N]).toBe(49);
    expect(Math.abs(out[LAG_R1X] - (lag1Autocorrelation(px) as number))).toBeLessThan(1e-12);
    expect(Math.abs(out[LAG_R1Y] - (lag1Autocorrelation(py) as number))).toBeLessThan(1e-12);
  });

  it('gives NaN r for fewer than three pairs or a constant member', () => {
    const out = new Float64Array(4);
    lagWindowStats(x, 0, y, 0, 2, out);
    expect(out[LAG_R]).toBeNaN();
    const flat = new Float64Array(10);
    lagWindowStatsComplete(flat, lagPrefixSums(flat), 0, y, lagPrefixSums(y), 0, 10, out);
    expect(out[LAG_N]).toBe(10);
    expect(out[LAG_R]).toBeNaN();
  });
});

describe('lagPrefixSums()', () => {
  it('gives window sums, sums of squares, lag-1 products and missing counts by differences', () => {
    const v = Float64Array.from([1, 2, NaN, 4, 5]);
    const p = lagPrefixSums(v);
    expect(p.sum[5] - p.sum[3]).toBe(9);
    expect(p.sumSq[2] - p.sumSq[0]).toBe(5);
    // Products inside [3, 5): 4·5 only.
    expect(p.lag1[4] - p.lag1[3]).toBe(20);
    expect(p.missing[5] - p.missing[0]).toBe(1);
  });
});

describe('prepareForCorrelation()', () => {
  it('centres on the mean and scales by a power of two to |x| ≤ 1, keeping NaN', () => {
    const p = prepareForCorrelation(Float64Array.from([1e300, 3e300, NaN]));
    expect(p[0]).toBeCloseTo(-p[1], 15);
    expect(Math.abs(p[1])).toBeLessThanOrEqual(1);
    expect(Math.abs(p[1])).toBeGreaterThan(0.5);
    expect(p[2]).toBeNaN();
  });

  it('still centres values near 1e308 whose plain sum overflows', () => {
    const p = prepareForCorrelation(Float64Array.from([1.5e308, 1.6e308, 1.7e308]));
    expect(p.every(Number.isFinite)).toBe(true);
    expect(p[1]).toBeCloseTo(0, 12);
    expect(p[0]).toBeCloseTo(-p[2], 12);
  });
});
