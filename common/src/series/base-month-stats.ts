/** Per-calendar-month tallies over a base period (index 0 = January). */
export interface BaseMonthStats {
  /** Compensated sum of the present values of each calendar month inside the base period. */
  sum: Float64Array;
  /** Number of present values of each calendar month inside the base period. */
  count: Int32Array;
  /** How often each calendar month occurs in the base period, present or not (its "years"). */
  occurrences: Int32Array;
}

/**
 * Tallies the values of x (month index `start` for x[0]; NaN = missing) inside the base period
 * [baseFrom, baseTo] (month indices, inclusive) by calendar month. Months of the base period
 * outside the series count as occurrences without values, so a short series fails the
 * minimum-years rule instead of silently producing a climatology from a few years.
 * Neumaier-compensated sums (Neumaier 1974) keep 1e8-offset data exact.
 */
export function baseMonthStats(x: Float64Array, start: number, baseFrom: number, baseTo: number): BaseMonthStats {
  const sum = new Float64Array(12);
  const comp = new Float64Array(12);
  const count = new Int32Array(12);
  const occurrences = new Int32Array(12);
  for (let m = baseFrom; m <= baseTo; m++) occurrences[m % 12]++;
  const i0 = Math.max(0, baseFrom - start);
  const i1 = Math.min(x.length - 1, baseTo - start);
  let cal = (start + i0) % 12;
  for (let i = i0; i <= i1; i++) {
    const v = x[i];
    if (v === v) {
      const s = sum[cal];
      const t = s + v;
      comp[cal] += Math.abs(s) >= Math.abs(v) ? s - t + v : v - t + s;
      sum[cal] = t;
      count[cal]++;
    }
    cal = cal === 11 ? 0 : cal + 1;
  }
  for (let m = 0; m < 12; m++) sum[m] += comp[m];
  return { sum, count, occurrences };
}
