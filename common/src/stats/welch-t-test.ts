import { studentTTwoSidedP } from './student-t';

/** Result of a t test: statistic, degrees of freedom and two-sided p; null where undefined. */
export interface TTestResult {
  t: number | null;
  dof: number | null;
  p: number | null;
}

/**
 * Welch's two-sample t test for unequal variances from each sample's count, mean and sum of
 * squared deviations M2 (e.g. from Welford updates): t = (x̄a − x̄b)/√(sa²/na + sb²/nb) with the
 * Welch–Satterthwaite degrees of freedom ν = (sa²/na + sb²/nb)² / ((sa²/na)²/(na−1) + (sb²/nb)²/(nb−1))
 * (Welch 1947, Biometrika 34:28–35), two-sided p from Student's t with ν (non-integer) degrees of
 * freedom — as scipy.stats.ttest_ind(equal_var=False). Nulls when a sample has fewer than two
 * values or both variances are zero.
 */
export function welchTTest(na: number, meanA: number, m2A: number, nb: number, meanB: number, m2B: number): TTestResult {
  if (!(na >= 2) || !(nb >= 2)) return { t: null, dof: null, p: null };
  const va = m2A / (na - 1) / na;
  const vb = m2B / (nb - 1) / nb;
  const se2 = va + vb;
  if (!(se2 > 0)) return { t: null, dof: null, p: null };
  const t = (meanA - meanB) / Math.sqrt(se2);
  const dof = (se2 * se2) / ((va * va) / (na - 1) + (vb * vb) / (nb - 1));
  return { t, dof, p: studentTTwoSidedP(t, dof) };
}
