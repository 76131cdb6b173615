/**
 * Prefix sums of a prepared series (see prepareForCorrelation) for the lag scan's gap-free
 * windows: over x[from..to) one reads Σx = sum[to] − sum[from], Σx² from sumSq, the lag-1 products
 * Σ x_t·x_{t+1} (t from..to−2) = lag1[to−1] − lag1[from], and the number of missing values from
 * missing. The series is centred and scaled to |x| ≤ 1 first, so the differences lose at most
 * ~n·ε in absolute terms — no worse than summing the window directly.
 */
export interface LagPrefixSums {
  sum: Float64Array;
  sumSq: Float64Array;
  lag1: Float64Array;
  missing: Float64Array;
}

/**
 * Builds the prefix sums of x (length n + 1 each, entry 0 = 0; NaN counted as missing, summed as 0),
 * in `work` (≥ 4(n + 1) doubles, e.g. a scratch buffer) when given.
 */
export function lagPrefixSums(x: Float64Array, work: Float64Array = new Float64Array(4 * (x.length + 1))): LagPrefixSums {
  const n = x.length;
  const sum = work.subarray(0, n + 1);
  const sumSq = work.subarray(n + 1, 2 * (n + 1));
  const lag1 = work.subarray(2 * (n + 1), 3 * (n + 1));
  const missing = work.subarray(3 * (n + 1), 4 * (n + 1));
  sum[0] = sumSq[0] = lag1[0] = missing[0] = 0;
  for (let i = 0; i < n; i++) {
    const v = x[i];
    const ok = v === v;
    sum[i + 1] = sum[i] + (ok ? v : 0);
    sumSq[i + 1] = sumSq[i] + (ok ? v * v : 0);
    missing[i + 1] = missing[i] + (ok ? 0 : 1);
    // lag1[i + 1] = Σ_{s ≤ i} x_s·x_{s+1}: adds the product starting at x[i].
    const next = i + 1 < n ? x[i + 1] : 0;
    lag1[i + 1] = lag1[i] + (ok && next === next ? v * next : 0);
  }
  return { sum, sumSq, lag1, missing };
}
