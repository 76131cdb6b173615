import { sampleSd } from '../stats/welford';
import { MONTH_NAMES } from './month';

/**
 * Divides each anomaly by the sample standard deviation (n − 1, Welford 1962) of the base-period
 * anomalies of its calendar month. x[0] is month index `start`; the base period is
 * [baseFrom, baseTo] (month indices, inclusive). A month whose sd is undefined (fewer than two
 * values) or zero gets NaN, with a warning.
 */
export function standardizeByMonth(
  x: Float64Array,
  start: number,
  baseFrom: number,
  baseTo: number,
): { values: Float64Array; warnings: string[] } {
  const sd = new Float64Array(12).fill(NaN);
  const warnings: string[] = [];
  for (let m = 0; m < 12; m++) {
    const members: number[] = [];
    for (let idx = Math.max(baseFrom, start); idx <= Math.min(baseTo, start + x.length - 1); idx++) {
      if (idx % 12 === m) members.push(x[idx - start]);
    }
    const s = sampleSd(members);
    if (s !== null && s > 0) sd[m] = s;
    else if (members.some((v) => v === v)) {
      warnings.push(`standardized anomalies of ${MONTH_NAMES[m]} are null: base-period sd is ${s === null ? 'undefined' : 'zero'}`);
    }
  }
  const out = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) out[i] = x[i] / sd[(start + i) % 12];
  return { values: out, warnings };
}
