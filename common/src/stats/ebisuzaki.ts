import { isPresent } from '../series/missing';
import { realDft } from './dft';
import { pearson } from './pearson';
import type { Rng } from './prng';

/** Result of ebisuzakiTest(): the observed r, the share of surrogates at least as extreme, and counts. */
export interface EbisuzakiResult {
  r: number | null;
  p: number | null;
  n: number;
  surrogates: number;
}

/**
 * Phase-randomisation significance test of a correlation between two serially correlated series
 * (Ebisuzaki, W. 1997, "A method to estimate the statistical significance of a correlation when
 * the data are serially correlated", J. Climate 10:2147–2153). Surrogates of x keep its Fourier
 * amplitudes with uniform random phases (conjugate-symmetric, zero mean; for even N the Nyquist
 * term becomes √2·|X|·cos θ, as in the paper); p = share of surrogates with |r_s| ≥ |r|.
 * Each r_s is computed in the frequency domain by Parseval's theorem, Σ s_t·y_t = (1/N)Σ S_k·conj(Y_k),
 * so a surrogate costs O(N) after two DFTs. Needs complete, equally long series (null p otherwise);
 * randomness comes only from the injected `rng`.
 */
export function ebisuzakiTest(x: ArrayLike<number | null>, y: ArrayLike<number | null>, rng: Rng, surrogates = 1000): EbisuzakiResult {
  const n = x.length;
  const complete = n === y.length && n >= 3 && allPresent(x) && allPresent(y);
  const r = complete ? pearson(x, y) : null;
  if (!complete || r === null) return { r, p: null, n, surrogates };
  const rs = ebisuzakiSurrogateCorrelations(x as ArrayLike<number>, y as ArrayLike<number>, rng, surrogates);
  let extreme = 0;
  for (let s = 0; s < surrogates; s++) if (Math.abs(rs[s]) >= Math.abs(r)) extreme++;
  return { r, p: extreme / surrogates, n, surrogates };
}

/**
 * The correlations r_s of `count` phase-randomised surrogates of x with y (complete, equally long
 * series), each from the spectra by Parseval's theorem in O(N) — the null distribution of
 * ebisuzakiTest. Draws from `rng` in the same order as ebisuzakiSurrogate.
 */
export function ebisuzakiSurrogateCorrelations(x: ArrayLike<number>, y: ArrayLike<number>, rng: Rng, count: number): Float64Array {
  const n = x.length;
  const X = realDft(centred(x));
  const Y = realDft(centred(y));
  const half = Math.floor(n / 2);
  const even = n % 2 === 0;
  const lastFull = even ? half - 1 : half;
  let yy = 0;
  for (let k = 1; k <= lastFull; k++) yy += 2 * (Y.re[k] * Y.re[k] + Y.im[k] * Y.im[k]);
  if (even) yy += Y.re[half] * Y.re[half];
  const out = new Float64Array(count);
  for (let s = 0; s < count; s++) {
    let sy = 0;
    let ss = 0;
    for (let k = 1; k <= lastFull; k++) {
      const amp = Math.hypot(X.re[k], X.im[k]);
      const theta = 2 * Math.PI * rng();
      // S_k·conj(Y_k) real part, doubled for the conjugate bin N − k.
      sy += 2 * amp * (Math.cos(theta) * Y.re[k] + Math.sin(theta) * Y.im[k]);
      ss += 2 * amp * amp;
    }
    if (even) {
      const sn = Math.SQRT2 * Math.hypot(X.re[half], X.im[half]) * Math.cos(2 * Math.PI * rng());
      sy += sn * Y.re[half];
      ss += sn * sn;
    }
    out[s] = ss > 0 && yy > 0 ? sy / Math.sqrt(ss * yy) : 0;
  }
  return out;
}

/**
 * One phase-randomised surrogate of x in the time domain (same recipe and same use of `rng` as
 * ebisuzakiTest, so a test can check one against the other). x must be complete; the result has
 * zero mean and x's amplitude spectrum.
 */
export function ebisuzakiSurrogate(x: ArrayLike<number>, rng: Rng): Float64Array {
  const n = x.length;
  const X = realDft(centred(x));
  const half = Math.floor(n / 2);
  const even = n % 2 === 0;
  const lastFull = even ? half - 1 : half;
  const re = new Float64Array(half + 1);
  const im = new Float64Array(half + 1);
  for (let k = 1; k <= lastFull; k++) {
    const amp = Math.hypot(X.re[k], X.im[k]);
    const theta = 2 * Math.PI * rng();
    re[k] = amp * Math.cos(theta);
    im[k] = amp * Math.sin(theta);
  }
  if (even) re[half] = Math.SQRT2 * Math.hypot(X.re[half], X.im[half]) * Math.cos(2 * Math.PI * rng());
  const out = new Float64Array(n);
  for (let t = 0; t < n; t++) {
    let v = 0;
    for (let k = 1; k <= lastFull; k++) {
      const w = (2 * Math.PI * k * t) / n;
      v += 2 * (re[k] * Math.cos(w) - im[k] * Math.sin(w));
    }
    if (even) v += re[half] * Math.cos(Math.PI * t);
    out[t] = v / n;
  }
  return out;
}

/** x minus its mean, as doubles. */
function centred(x: ArrayLike<number>): Float64Array {
  let m = 0;
  for (let i = 0; i < x.length; i++) m += (x[i] - m) / (i + 1);
  return Float64Array.from(x, (v) => v - m);
}

/** Whether every value is present (the missing-value rule of series/missing.ts). */
function allPresent(x: ArrayLike<number | null>): boolean {
  for (let i = 0; i < x.length; i++) {
    const v = x[i];
    if (!isPresent(v)) return false;
  }
  return true;
}
