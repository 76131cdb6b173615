import { isPresent } from './missing';
import { parseMonth } from './month';
import type { MonthlySeries } from './types';

/**
 * The series' values on the span of `length` months from month index `spanStart`, aligned by
 * calendar month; months outside the series or missing are NaN. This is how the engine aligns
 * two series whose starts differ.
 */
export function valuesOnSpan(series: MonthlySeries, spanStart: number, length: number): Float64Array {
  const out = new Float64Array(length).fill(NaN);
  const offset = parseMonth(series.start) - spanStart;
  const from = Math.max(0, offset);
  const to = Math.min(length, offset + series.values.length);
  for (let i = from; i < to; i++) {
    const v = series.values[i - offset];
    if (isPresent(v)) out[i] = v;
  }
  return out;
}
