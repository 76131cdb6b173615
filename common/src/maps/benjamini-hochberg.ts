/** Result of benjaminiHochberg(). */
export interface FdrResult {
  /** 1 where the test is rejected (significant), per input position. */
  significant: Uint8Array;
  /** BH-adjusted p-values (NaN where the input p is missing). */
  adjusted: Float64Array;
  /** The largest p rejected (0 when none), and how many p-values were tested. */
  threshold: number;
  tested: number;
}

/**
 * Benjamini–Hochberg false-discovery-rate control at level q (Benjamini & Hochberg 1995, J. R.
 * Stat. Soc. B 57:289–300): with the m present p-values sorted, p_(1) ≤ … ≤ p_(m), reject every
 * p ≤ p_(k) for the largest k with p_(k) ≤ k·q/m. Adjusted p_(i) = min over j ≥ i of m·p_(j)/j,
 * capped at 1 — as statsmodels' multipletests(method="fdr_bh"). Missing (non-finite) p-values
 * are not tested and do not count in m. The p-values are sorted as a typed array (a native numeric
 * sort: a million cells take tens of ms) and each cell finds its rank by binary search; tied
 * p-values share the adjusted value of the last of the tie, as the running minimum gives them.
 */
export function benjaminiHochberg(p: ArrayLike<number>, q: number): FdrResult {
  let m = 0;
  for (let i = 0; i < p.length; i++) if (p[i] - p[i] === 0) m++;
  const sorted = new Float64Array(m);
  for (let i = 0, j = 0; i < p.length; i++) if (p[i] - p[i] === 0) sorted[j++] = p[i];
  sorted.sort();
  let k = -1;
  for (let j = 0; j < m; j++) if (sorted[j] <= ((j + 1) * q) / m) k = j;
  const threshold = k >= 0 ? sorted[k] : 0;
  const running = new Float64Array(m);
  let min = 1;
  for (let j = m - 1; j >= 0; j--) running[j] = min = Math.min(min, (m * sorted[j]) / (j + 1));
  const significant = new Uint8Array(p.length);
  const adjusted = new Float64Array(p.length).fill(NaN);
  for (let i = 0; i < p.length; i++) {
    const v = p[i];
    if (v - v !== 0) continue;
    if (k >= 0 && v <= threshold) significant[i] = 1;
    adjusted[i] = running[lastIndexOf(sorted, v)];
  }
  return { significant, adjusted, threshold, tested: m };
}

/** Index of the last element equal to v in an ascending array that holds v. */
function lastIndexOf(sorted: Float64Array, v: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] <= v) lo = mid + 1;
    else hi = mid;
  }
  return lo - 1;
}
