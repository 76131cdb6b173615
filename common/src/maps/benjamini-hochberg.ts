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
 * are not tested and do not count in m.
 */
export function benjaminiHochberg(p: ArrayLike<number>, q: number): FdrResult {
  const order: number[] = [];
  for (let i = 0; i < p.length; i++) if (p[i] - p[i] === 0) order.push(i);
  order.sort((a, b) => p[a] - p[b]);
  const m = order.length;
  const significant = new Uint8Array(p.length);
  const adjusted = new Float64Array(p.length).fill(NaN);
  let k = -1;
  for (let j = 0; j < m; j++) if (p[order[j]] <= ((j + 1) * q) / m) k = j;
  for (let j = 0; j <= k; j++) significant[order[j]] = 1;
  let running = 1;
  for (let j = m - 1; j >= 0; j--) {
    running = Math.min(running, (m * p[order[j]]) / (j + 1));
    adjusted[order[j]] = running;
  }
  return { significant, adjusted, threshold: k >= 0 ? p[order[k]] : 0, tested: m };
}
