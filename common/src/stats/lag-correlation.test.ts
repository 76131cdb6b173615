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

  it('takes the same values on gap-free windows (prefix-sum path) as simple-statistics sampleCorrelation() and lag1Autocorrelation()', () => {
    const xv = ar1(240, 0.7, 12);
    const yv = ar1(260, 0.5, 13).map((v, i) => v + 0.4 * (xv[i] ?? 0));
    const res = lagCorrelation({ x: { start: '1990-01', values: xv }, y: { start: '1990-04', values: yv }, maxLag: 24 });
    for (const row of res.lags) {
      const { px, py } = pairsAt({ start: 1990 * 12, v: xv }, { start: 1990 * 12 + 3, v: yv }, row.lag);
      expect(row.n).toBe(px.length);
      expect(Math.abs((row.r as number) - sampleCorrelation(px as number[], py as number[]))).toBeLessThan(1e-12);
      const nEff = effectiveSampleSize(row.n, lag1Autocorrelation(px), lag1Autocorrelation(py)) as number;
      expect(Math.abs((row.nEff as number) - nEff)).toBeLessThan(1e-9 * nEff);
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

/** An AR(1) series after a 50-month spin-up, drawn from a shared rng. */
function ar1From(rng: () => number, n: number, phi: number): number[] {
  let a = 0;
  const out: number[] = [];
  for (let i = 0; i < n + 50; i++) {
    a = phi * a + normalVariate(rng);
    if (i >= 50) out.push(a);
  }
  return out;
}

describe('lagCorrelation() — the strongest lag and its search-corrected p (Ebisuzaki 1997 surrogates)', () => {
  // Monte Carlo under the null: independent pairs, 120 months, lags ±24. Expected rate of a valid
  // 5 % test: 5 %; with S surrogates and p = count/S, P(p < 0.05) = ⌈0.05·S⌉/(S + 1) ≈ 5 % for
  // exchangeable surrogates, so 3–7 % is the acceptance band (±2 binomial sd at 500 pairs ≈ ±1.9 %).
  // 100 surrogates per pair (not the route's default 1000) keep the test to about a second per case on a quiet machine.
  for (const [phiX, phiY, label] of [[0.8, 0.6, 'AR(1) φ 0.8 and 0.6'], [0, 0, 'white noise']] as const) {
    it(`rejects the null at 5 % in 3–7 % of 500 independent ${label} pairs with pSearch (pointwise p of the maximum: far more)`, () => {
      const rng = mulberry32(7);
      let pointwise = 0;
      let corrected = 0;
      const pairs = 500;
      for (let i = 0; i < pairs; i++) {
        const x = ar1From(rng, 120, phiX);
        const y = ar1From(rng, 120, phiY);
        const { strongest } = lagCorrelation({ x: { start: '2000-01', values: x }, y: { start: '2000-01', values: y }, maxLag: 24, surrogates: 100, seed: i + 1 });
        if ((strongest!.p as number) < 0.05) pointwise++;
        if ((strongest!.pSearch as number) < 0.05) corrected++;
      }
      // Measured when written: AR(1) pointwise 64.8 %, corrected 5.6 %; white noise 92.8 % and 4.0 %; over 3000 AR(1)
      // pairs with 200 surrogates: 61.7 % and 5.3 %. (Issue 14 reports about 60 % and 91 % for the pointwise p.)
      expect(corrected / pairs).toBeGreaterThanOrEqual(0.03);
      expect(corrected / pairs).toBeLessThanOrEqual(0.07);
      expect(pointwise / pairs).toBeGreaterThan(0.4);
    }, 60_000);
  }

  it('chooses the strongest only among lags with at least two thirds of the overlap’s pairs', () => {
    // 30 months; at lag ±20 only 10 pairs remain, and there y is built to equal x exactly.
    const x = ar1(30, 0.3, 21);
    const y = ar1(30, 0.3, 22);
    for (let i = 0; i + 20 < 30; i++) y[i + 20] = x[i];
    const res = lagCorrelation({ x: { start: '2000-01', values: x }, y: { start: '2000-01', values: y }, maxLag: 20 });
    const at20 = res.lags.find((l) => l.lag === 20)!;
    expect(at20.r).toBeCloseTo(1, 12);
    expect(res.strongest!.n).toBeGreaterThanOrEqual(20);
    expect(res.strongest!.lag).toBeLessThanOrEqual(10);
    expect(res.strongest!.pSearch).toBeNull();
    const best = res.lags.filter((l) => l.n >= 20).reduce((a, b) => (Math.abs(b.r!) > Math.abs(a.r!) ? b : a));
    expect(res.strongest).toEqual({ ...best, pSearch: null });
  });

  it('repeats with the same seed, finds a real 3-month lead (pSearch 0), and reports per-lag surrogate p when asked', () => {
    const x = ar1(240, 0.6, 31);
    const y = [0, 0, 0, ...x.slice(0, 237)].map((v, i) => v + 0.5 * ar1(240, 0.2, 32)[i]);
    const body = { x: { start: '1990-01', values: x }, y: { start: '1990-01', values: y }, maxLag: 12, surrogates: 300, seed: 7 };
    const a = lagCorrelation({ ...body, significance: 'phase-randomised' });
    expect(lagCorrelation({ ...body, significance: 'phase-randomised' })).toEqual(a);
    expect(a.strongest!.lag).toBe(3);
    expect(a.strongest!.pSearch).toBe(0);
    expect(a.lags.every((l) => l.p !== null && l.p >= 0 && l.p <= 1 && Math.abs(l.p * 300 - Math.round(l.p * 300)) < 1e-9)).toBe(true);
    const ar = lagCorrelation(body);
    expect(ar.strongest!.p).toBe(ar.lags.find((l) => l.lag === 3)!.p);
  });

  it('gives pSearch null for a series with a gap inside and for Spearman, but trims leading and trailing gaps', () => {
    const x: (number | null)[] = ar1(120, 0.5, 41);
    const y: (number | null)[] = ar1(120, 0.5, 42);
    const base = { x: { start: '2000-01', values: x }, y: { start: '2000-01', values: y }, maxLag: 6, surrogates: 50 };
    expect(lagCorrelation({ ...base, method: 'spearman' }).strongest!.pSearch).toBeNull();
    const edged = { ...base, x: { start: '2000-01', values: [null, ...x.slice(1)] } };
    expect(lagCorrelation(edged).strongest!.pSearch).not.toBeNull();
    x[60] = null;
    expect(lagCorrelation(base).strongest!.pSearch).toBeNull();
  });
});
