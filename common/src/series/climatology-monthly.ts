import type { BaseMonthStats } from './base-month-stats';
import { MONTH_NAMES } from './month';

/**
 * Monthly-mean climatology: the mean of each calendar month's present base-period values.
 * A calendar month needs valid values in at least `minYears` of its base-period years, by default
 * 80% of them rounded up (24 of 30) — the rule for monthly normals of WMO Guidelines on the
 * Calculation of Climate Normals, WMO-No. 1203 (2017). Failing months are NaN, with a warning.
 */
export function monthlyClimatology(
  stats: BaseMonthStats,
  minYears?: number,
): { climatology: Float64Array; warnings: string[] } {
  const climatology = new Float64Array(12).fill(NaN);
  const warnings: string[] = [];
  for (let m = 0; m < 12; m++) {
    const years = stats.occurrences[m];
    const need = Math.max(1, minYears ?? Math.ceil(0.8 * years));
    const have = stats.count[m];
    if (have >= need) climatology[m] = stats.sum[m] / have;
    else if (years > 0) {
      warnings.push(
        `climatology of ${MONTH_NAMES[m]} is null: valid values in ${have} of ${years} base-period years, ` +
          `fewer than minYears = ${need} (WMO-No. 1203 rule for monthly normals)`,
      );
    }
  }
  return { climatology, warnings };
}
