/**
 * Discrete Fourier transform X_k = Σ_t x_t·e^(−2πi·kt/N) of a real series, for k = 0..⌊N/2⌋ (the
 * rest follow by conjugate symmetry). Direct O(N²) sum with a precomputed twiddle table — adequate
 * for monthly series of a few thousand points, and exact to rounding for any N (no radix-2 padding).
 */
export function realDft(x: ArrayLike<number>): { re: Float64Array; im: Float64Array } {
  const n = x.length;
  const half = Math.floor(n / 2);
  const re = new Float64Array(half + 1);
  const im = new Float64Array(half + 1);
  const cos = new Float64Array(n);
  const sin = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    cos[j] = Math.cos((2 * Math.PI * j) / n);
    sin[j] = Math.sin((2 * Math.PI * j) / n);
  }
  for (let k = 0; k <= half; k++) {
    let a = 0;
    let b = 0;
    // (k·t) mod n indexes the table, so no angle is recomputed.
    for (let t = 0, idx = 0; t < n; t++, idx = (idx + k) % n) {
      a += x[t] * cos[idx];
      b -= x[t] * sin[idx];
    }
    re[k] = a;
    im[k] = b;
  }
  return { re, im };
}
