import { describe, expect, it } from 'vitest';
import { sampleCorrelation, sampleRankCorrelation } from 'simple-statistics';
import { correlationPValue } from './correlation-p-value';
import { effectiveSampleSize } from './effective-sample-size';
import { lag1Autocorrelation } from './lag1-autocorrelation';
import { lagCorrelation } from './lag-correlation';
import { mulberry32, normalVariate } from './prng';

/** An AR(1) series a_t = phi·a_{t−1} + e_t, seeded. */
function ar1(n: number, phi: number, seed: number): number[] {
  const rng = mulberry32(seed);
  const out: number[] = [];
  let a = 0;
  for (let i = 0; i < n; i++) out.push((a = phi * a + normalVariate(rng)));
  return out;
}

/** Brute-force pairs at lag k by calendar month: x at month t with y at month t + k. */
function pairsAt(x: { start: number; v: (number | null)[] }, y: { start: number; v: (number | null)[] }, k: number) {
  const px: (number | null)[] = [];
  const py: (number | null)[] = [];
  for (let i = 0; i < x.v.length; i++) {
    const j = x.start + i + k - y.start;
    if (j < 0 || j >= y.v.length) continue;
    const both = x.v[i] !== null && y.v[j] !== null;
    px.push(both ? x.v[i] : null);
    py.push(both ? y.v[j] : null);
  }
  return { px, py };
}

describe('lagCorrelation()', () => {
  it('pairs x at month t with y at month t+k: a y that lags x by 3 months peaks at lag +3 with r = 1', () => {
    const x = ar1(200, 0.5, 1);
    const y = [0, 0, 0, ...x.slice(0, 197)];
    const { lags } = lagCorrelation({ x: { start: '1990-01', values: x }, y: { start: '1990-01', values: y }, maxLag: 6 });
    expect(lags.map((l) => l.lag)).toEqual([-6, -5, -4, -3, -2, -1, 0, 1, 2, 3, 4, 5, 6]);
    const best = lags.reduce((a, b) => ((b.r ?? -2) > (a.r ?? -2) ? b : a));
    expect(best.lag).toBe(3);
    expect(best.r).toBeCloseTo(1, 12);
  });

  it('matches simple-statistics sampleCorrelation() on the brute-force pairs at every lag, with different starts and gaps', () => {
    const xv: (number | null)[] = ar1(150, 0.6, 2);
    const yv: (number | null)[] = ar1(170, 0.3, 3).map((v, i) => v + 0.5 * ((xv[i] as number) ?? 0));
    xv[10] = null;
    yv[40] = null;
    const res = lagCorrelation({ x: { start: '1980-05', values: xv }, y: { start: '1979-11', values: yv }, maxLag: 12 });
    for (const row of res.lags) {
      const { px, py } = pairsAt({ start: 1980 * 12 + 4, v: xv }, { start: 1979 * 12 + 10, v: yv }, row.lag);
      const a = px.filter((v) => v !== null) as number[];
      const b = py.filter((v) => v !== null) as number[];
      expect(row.n).toBe(a.length);
      expect(Math.abs((row.r as number) - sampleCorrelation(a, b))).toBeLessThan(1e-12);
    }
  });

  it('computes nEff = n(1 − r1x·r1y)/(1 + r1x·r1y) (Bretherton et al. 1999, J. Climate 12:1990–2009) from the paired values, and p from it', () => {
    const xv = ar1(300, 0.8, 4);
    const yv = ar1(300, 0.6, 5).map((v, i) => v + 0.3 * xv[i]);
    const row = lagCorrelation({ x: { start: '1950-01', values: xv }, y: { start: '1950-01', values: yv }, maxLag: 2 }).lags[3];
    const { px, py } = pairsAt({ start: 0, v: xv }, { start: 0, v: yv }, 1);
    const nEff = effectiveSampleSize(row.n, lag1Autocorrelation(px), lag1Autocorrelation(py)) as number;
    expect(row.lag).toBe(1);
    expect(row.nEff as number).toBeCloseTo(nEff, 10);
    expect(row.nEff as number).toBeLessThan(row.n / 2);
    expect(row.p as number).toBeCloseTo(correlationPValue(row.r, nEff) as number, 12);
  });

  it('ranks per lag for Spearman — matches simple-statistics sampleRankCorrelation() on tied data', () => {
    const rng = mulberry32(11);
    const xv = Array.from({ length: 120 }, () => Math.round(rng() * 10));
    const yv = xv.map((v) => Math.round(v / 2 + rng() * 4));
    const res = lagCorrelation({ x: { start: '2000-01', values: xv }, y: { start: '2000-01', values: yv }, maxLag: 2, method: 'spearman' });
    for (const row of res.lags) {
      const { px, py } = pairsAt({ start: 0, v: xv }, { start: 0, v: yv }, row.lag);
      expect(Math.abs((row.r as number) - sampleRankCorrelation(px as number[], py as number[]))).toBeLessThan(1e-12);
    }
  });

  it('gives n = 0 and null r, nEff, p for lags longer than the overlap', () => {
    const res = lagCorrelation({ x: { start: '2000-01', values: [1, 2, 3, 4, 5] }, y: { start: '2000-01', values: [2, 1, 4, 3, 5] }, maxLag: 6 });
    const far = res.lags.find((l) => l.lag === 6)!;
    expect(far).toEqual({ lag: 6, r: null, n: 0, nEff: null, p: null });
    const three = res.lags.find((l) => l.lag === 3)!;
    expect(three.n).toBe(2);
    expect(three.r).toBeNull();
  });

  it('gives null r and p for a constant series, empty input, or one value', () => {
    const flat = lagCorrelation({ x: { start: '2000-01', values: [2, 2, 2, 2, 2] }, y: { start: '2000-01', values: [1, 3, 2, 5, 4] }, maxLag: 1 });
    expect(flat.lags.every((l) => l.r === null && l.p === null)).toBe(true);
    expect(lagCorrelation({ x: { start: '2000-01', values: [] }, y: { start: '2000-01', values: [] }, maxLag: 1 }).lags.every((l) => l.n === 0)).toBe(true);
    expect(lagCorrelation({ x: { start: '2000-01', values: [1] }, y: { start: '2000-01', values: [1] }, maxLag: 0 }).lags[0].r).toBeNull();
  });

  it('is unchanged by 1e8 offsets and by 1e300 scaling', () => {
    const xv = ar1(100, 0.4, 6);
    const yv = ar1(100, 0.4, 7).map((v, i) => v + xv[i]);
    const base = lagCorrelation({ x: { start: '2000-01', values: xv }, y: { start: '2000-01', values: yv }, maxLag: 3 });
    const off = lagCorrelation({ x: { start: '2000-01', values: xv.map((v) => v + 1e8) }, y: { start: '2000-01', values: yv.map((v) => v * 1e300) }, maxLag: 3 });
    base.lags.forEach((row, i) => {
      expect(off.lags[i].r as number).toBeCloseTo(row.r as number, 8);
      expect(off.lags[i].nEff as number).toBeCloseTo(row.nEff as number, 6);
    });
  });
});
