import { studentTTwoSidedP } from './student-t';
import type { TTestResult } from './welch-t-test';

/**
 * One-sample t test of a mean against zero from the sample's count, mean and sum of squared
 * deviations M2: t = x̄/(s/√n), n − 1 degrees of freedom, two-sided p (Student 1908; as
 * scipy.stats.ttest_1samp). Nulls with fewer than two values or zero spread.
 */
export function oneSampleTTest(n: number, mean: number, m2: number): TTestResult {
  if (!(n >= 2) || !(m2 > 0)) return { t: null, dof: null, p: null };
  const t = mean / Math.sqrt(m2 / (n - 1) / n);
  return { t, dof: n - 1, p: studentTTwoSidedP(t, n - 1) };
}
