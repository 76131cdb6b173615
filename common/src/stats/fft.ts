/**
 * A reusable complex FFT of one length n: `transform(re, im, inverse)` overwrites re/im with
 * X_k = Σ_t x_t·e^(∓2πi·kt/n) (− forward, + inverse; the inverse is not divided by n).
 */
export interface FftPlan {
  n: number;
  transform(re: Float64Array, im: Float64Array, inverse: boolean): void;
}

/**
 * Plans an FFT of any length n ≥ 1: iterative radix-2 (Cooley & Tukey 1965, Math. Comp. 19:297)
 * when n is a power of two, mixed radix (the same recursion over n's prime factors) when every
 * prime factor is at most 13 (monthly lengths such as 120 or 600), otherwise Bluestein's chirp-z algorithm (Bluestein 1970, IEEE Trans.
 * Audio Electroacoust. 18:451), which rewrites kt = (k² + t² − (k−t)²)/2 so the DFT becomes a
 * convolution done with power-of-two FFTs of length ≥ 2n − 1. Twiddles, chirp and work buffers are
 * made once here, so each transform allocates nothing (the surrogate loop calls it thousands of times).
 */
export function fftPlan(n: number): FftPlan {
  if ((n & (n - 1)) === 0) return radix2Plan(n);
  const factors = smallPrimeFactors(n);
  if (factors) return mixedRadixPlan(n, factors);
  let m = 1;
  while (m < 2 * n - 1) m *= 2;
  const inner = radix2Plan(m);
  // Chirp w_t = e^(−iπt²/n); t² is reduced mod 2n so the angle stays exact for long series.
  const cr = new Float64Array(n);
  const ci = new Float64Array(n);
  for (let t = 0; t < n; t++) {
    const a = (Math.PI * ((t * t) % (2 * n))) / n;
    cr[t] = Math.cos(a);
    ci[t] = -Math.sin(a);
  }
  // Spectrum of the conjugate chirp b_t = conj(w_t), wrapped for circular convolution.
  const br = new Float64Array(m);
  const bi = new Float64Array(m);
  br[0] = cr[0];
  bi[0] = -ci[0];
  for (let t = 1; t < n; t++) {
    br[t] = br[m - t] = cr[t];
    bi[t] = bi[m - t] = -ci[t];
  }
  inner.transform(br, bi, false);
  const ar = new Float64Array(m);
  const ai = new Float64Array(m);
  return {
    n,
    transform(re, im, inverse) {
      // The inverse is the forward transform of the conjugate, conjugated.
      const s = inverse ? -1 : 1;
      ar.fill(0);
      ai.fill(0);
      for (let t = 0; t < n; t++) {
        const xr = re[t];
        const xi = s * im[t];
        ar[t] = xr * cr[t] - xi * ci[t];
        ai[t] = xr * ci[t] + xi * cr[t];
      }
      inner.transform(ar, ai, false);
      for (let k = 0; k < m; k++) {
        const xr = ar[k] * br[k] - ai[k] * bi[k];
        ai[k] = ar[k] * bi[k] + ai[k] * br[k];
        ar[k] = xr;
      }
      inner.transform(ar, ai, true);
      for (let k = 0; k < n; k++) {
        const xr = ar[k] / m;
        const xi = ai[k] / m;
        re[k] = xr * cr[k] - xi * ci[k];
        im[k] = s * (xr * ci[k] + xi * cr[k]);
      }
    },
  };
}

/** In-place iterative radix-2 FFT of a power-of-two length, with precomputed twiddles. */
function radix2Plan(n: number): FftPlan {
  const cos = new Float64Array(n / 2);
  const sin = new Float64Array(n / 2);
  for (let j = 0; j < n / 2; j++) {
    cos[j] = Math.cos((2 * Math.PI * j) / n);
    sin[j] = Math.sin((2 * Math.PI * j) / n);
  }
  const rev = new Uint32Array(n);
  for (let i = 1, j = 0; i < n; i++) {
    let bit = n >> 1;
    for (; j & bit; bit >>= 1) j ^= bit;
    j ^= bit;
    rev[i] = j;
  }
  return {
    n,
    transform(re, im, inverse) {
      for (let i = 0; i < n; i++) {
        const j = rev[i];
        if (j > i) {
          const tr = re[i]; re[i] = re[j]; re[j] = tr;
          const ti = im[i]; im[i] = im[j]; im[j] = ti;
        }
      }
      const s = inverse ? 1 : -1;
      for (let size = 2; size <= n; size *= 2) {
        const half = size / 2;
        const step = n / size;
        for (let start = 0; start < n; start += size) {
          for (let j = 0, w = 0; j < half; j++, w += step) {
            const wr = cos[w];
            const wi = s * sin[w];
            const a = start + j;
            const b = a + half;
            const tr = re[b] * wr - im[b] * wi;
            const ti = re[b] * wi + im[b] * wr;
            re[b] = re[a] - tr;
            im[b] = im[a] - ti;
            re[a] += tr;
            im[a] += ti;
          }
        }
      }
    },
  };
}

/** The prime factors of n in ascending order when all are ≤ 13, else null. */
function smallPrimeFactors(n: number): number[] | null {
  const out: number[] = [];
  let rest = n;
  for (const p of [2, 3, 5, 7, 11, 13]) while (rest % p === 0) { out.push(p); rest /= p; }
  return rest === 1 ? out : null;
}

/**
 * Recursive decimation-in-time FFT over the prime factors of n (Cooley & Tukey 1965, general radix):
 * a length p·m transform is p transforms of length m over the inputs r, r + p, r + 2p, … combined
 * with twiddles W^(r·k), each output column done in place through a p-long buffer.
 */
function mixedRadixPlan(n: number, factors: number[]): FftPlan {
  const cos = new Float64Array(n);
  const sin = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    cos[j] = Math.cos((2 * Math.PI * j) / n);
    sin[j] = Math.sin((2 * Math.PI * j) / n);
  }
  const outRe = new Float64Array(n);
  const outIm = new Float64Array(n);
  const p0 = Math.max(...factors);
  const tr = new Float64Array(p0);
  const ti = new Float64Array(p0);
  let sign = -1;
  const rec = (re: Float64Array, im: Float64Array, inOff: number, stride: number, len: number, outOff: number, fi: number): void => {
    if (len === 1) {
      outRe[outOff] = re[inOff];
      outIm[outOff] = im[inOff];
      return;
    }
    const p = factors[fi];
    const m = len / p;
    for (let r = 0; r < p; r++) rec(re, im, inOff + r * stride, stride * p, m, outOff + r * m, fi + 1);
    const step = n / len;
    for (let k = 0; k < m; k++) {
      for (let r = 0; r < p; r++) {
        const at = outOff + r * m + k;
        const e = (r * k * step) % n;
        const wr = cos[e];
        const wi = sign * sin[e];
        tr[r] = outRe[at] * wr - outIm[at] * wi;
        ti[r] = outRe[at] * wi + outIm[at] * wr;
      }
      for (let q = 0; q < p; q++) {
        let ar = tr[0];
        let ai = ti[0];
        for (let r = 1; r < p; r++) {
          // W_len^(r·q·m) = W_p^(r·q), an n-th root of unity of exponent r·q·(n/p).
          const e = ((r * q) % p) * (n / p);
          const wr = cos[e];
          const wi = sign * sin[e];
          ar += tr[r] * wr - ti[r] * wi;
          ai += tr[r] * wi + ti[r] * wr;
        }
        outRe[outOff + k + q * m] = ar;
        outIm[outOff + k + q * m] = ai;
      }
    }
  };
  return {
    n,
    transform(re, im, inverse) {
      sign = inverse ? 1 : -1;
      rec(re, im, 0, 1, n, 0, 0);
      re.set(outRe);
      im.set(outIm);
    },
  };
}
