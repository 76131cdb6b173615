import { fftPlan } from './fft';
import { laggedCrossProducts } from './lagged-cross-products';
import type { Rng } from './prng';

/** Inputs of lagSearchSurrogates(): two gap-free series and the lag window of the scan. */
export interface LagSearchSurrogatesInput {
  /** x, gap-free (prepared: centred and scaled; correlation ignores both). */
  x: Float64Array;
  /** y, gap-free. */
  y: Float64Array;
  /** y's first month minus x's first month. */
  d: number;
  maxLag: number;
  /** Observed |r| per lag (index lag + maxLag); NaN where undefined. */
  observedAbsR: Float64Array;
  /** Lags (index lag + maxLag) that take part in the maximum; the search statistic is max |r| over them. */
  eligible: Uint8Array;
  rng: Rng;
  surrogates: number;
}

/** Per-lag phase-randomisation p (NaN where undefined) and the search-corrected p of the maximum. */
export interface LagSearchSurrogatesResult {
  pLag: Float64Array;
  pSearch: number | null;
}

/**
 * Phase-randomised surrogates of x (Ebisuzaki 1997, J. Climate 10:2147–2153) scanned over the same
 * lag window as the observed correlation. For each surrogate: pLag counts lags where |r_s,k| ≥ |r_k|;
 * pSearch counts surrogates whose max |r_s,k| over the eligible lags reaches the observed max, so
 * it accounts for having searched many lags (a field-significance style test, cf. Livezey & Chen
 * 1983, Mon. Wea. Rev. 111:46). Surrogates are built by one inverse FFT each (fftPlan), with the
 * random draws in the order of ebisuzakiSurrogate; the window sums of y are computed once, those
 * of the surrogate from its prefix sums, and the cross-products by laggedCrossProducts.
 */
export function lagSearchSurrogates(req: LagSearchSurrogatesInput): LagSearchSurrogatesResult {
  const { x, y, d, maxLag, observedAbsR, eligible, rng, surrogates } = req;
  const n = x.length;
  const lags = 2 * maxLag + 1;
  const plan = fftPlan(n);
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  let mean = 0;
  for (let t = 0; t < n; t++) mean += x[t];
  mean /= n;
  for (let t = 0; t < n; t++) re[t] = x[t] - mean;
  plan.transform(re, im, false);
  const half = Math.floor(n / 2);
  const even = n % 2 === 0;
  const lastFull = even ? half - 1 : half;
  const amp = new Float64Array(half + 1);
  for (let k = 1; k <= half; k++) amp[k] = Math.hypot(re[k], im[k]);
  // Each lag's window and the sums of y over it, once for all surrogates.
  const i0 = new Int32Array(lags);
  const len = new Int32Array(lags);
  const sumY = new Float64Array(lags);
  const ssY = new Float64Array(lags);
  const pyS = prefix(y, false);
  const pyQ = prefix(y, true);
  for (let q = 0; q < lags; q++) {
    const k = q - maxLag;
    const a = Math.max(0, d - k);
    const b = Math.min(n - 1, y.length - 1 + d - k);
    i0[q] = a;
    len[q] = Math.max(0, b - a + 1);
    const j0 = a + k - d;
    if (len[q] > 0) {
      sumY[q] = pyS[j0 + len[q]] - pyS[j0];
      ssY[q] = pyQ[j0 + len[q]] - pyQ[j0] - (sumY[q] * sumY[q]) / len[q];
    }
  }
  const s = new Float64Array(n);
  const ps = new Float64Array(n + 1);
  const pq = new Float64Array(n + 1);
  const cross = new Float64Array(lags);
  const exceed = new Float64Array(lags);
  let observedMax = -1;
  for (let q = 0; q < lags; q++) if (eligible[q] && observedAbsR[q] > observedMax) observedMax = observedAbsR[q];
  // Ties within rounding count as reaching the observed value (a surrogate equal to the data must count).
  const bar = observedMax * (1 - 1e-12);
  let reach = 0;
  for (let r = 0; r < surrogates; r++) {
    re.fill(0);
    im.fill(0);
    for (let k = 1; k <= lastFull; k++) {
      const theta = 2 * Math.PI * rng();
      re[k] = re[n - k] = amp[k] * Math.cos(theta);
      im[k] = amp[k] * Math.sin(theta);
      im[n - k] = -im[k];
    }
    if (even) re[half] = Math.SQRT2 * amp[half] * Math.cos(2 * Math.PI * rng());
    plan.transform(re, im, true);
    for (let t = 0; t < n; t++) {
      const v = re[t] / n;
      s[t] = v;
      ps[t + 1] = ps[t] + v;
      pq[t + 1] = pq[t] + v * v;
    }
    laggedCrossProducts(s, y, d, maxLag, cross);
    let max = 0;
    for (let q = 0; q < lags; q++) {
      const m = len[q];
      if (!(observedAbsR[q] >= 0) || m < 3) continue;
      const a = i0[q];
      const ss = ps[a + m] - ps[a];
      const sxx = pq[a + m] - pq[a] - (ss * ss) / m;
      const rs = sxx > 0 && ssY[q] > 0 ? Math.abs((cross[q] - (ss * sumY[q]) / m) / Math.sqrt(sxx * ssY[q])) : 0;
      if (rs >= observedAbsR[q] * (1 - 1e-12)) exceed[q]++;
      if (eligible[q] && rs > max) max = rs;
    }
    if (max >= bar) reach++;
  }
  const pLag = new Float64Array(lags);
  for (let q = 0; q < lags; q++) pLag[q] = observedAbsR[q] >= 0 && surrogates > 0 ? exceed[q] / surrogates : NaN;
  return { pLag, pSearch: observedMax >= 0 && surrogates > 0 ? reach / surrogates : null };
}

/** Prefix sums of x (or of x² when `squares`), length n + 1. */
function prefix(x: Float64Array, squares: boolean): Float64Array {
  const out = new Float64Array(x.length + 1);
  for (let i = 0; i < x.length; i++) out[i + 1] = out[i] + (squares ? x[i] * x[i] : x[i]);
  return out;
}
