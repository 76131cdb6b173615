import { isPresent } from '../series/missing';
import { mean } from './mean';
import { maxAbs, overflowSafeScale } from './scale';

/**
 * Lag-1 autocorrelation r1 = Σ(y_t − ȳ)(y_{t+1} − ȳ) / Σ(y_t − ȳ)², the NIST StRD univariate
 * definition (itl.nist.gov/div898/strd/univ). Missing values are skipped in the denominator and
 * break the lag-1 products: a product needs both t and t+1 present, so gaps never join distant
 * values. Two passes (mean first) with compensated sums. null when fewer than two values are
 * present or the series is constant.
 */
export function lag1Autocorrelation(values: ArrayLike<number | null>): number | null {
  const m = mean(values);
  if (m === null) return null;
  const scale = overflowSafeScale(maxAbs(values));
  const centre = m * scale;
  let num = 0;
  let numC = 0;
  let den = 0;
  let denC = 0;
  let count = 0;
  let prev = NaN;
  for (let i = 0; i < values.length; i++) {
    const raw = values[i];
    const present = isPresent(raw);
    const d = present ? (raw as number) * scale - centre : NaN;
    if (present) {
      count++;
      [den, denC] = twoSumStep(den, denC, d * d);
      if (prev === prev) [num, numC] = twoSumStep(num, numC, prev * d);
    }
    prev = d;
  }
  const denominator = den + denC;
  if (count < 2 || denominator === 0) return null;
  return (num + numC) / denominator;
}

/** One Neumaier step: returns the new sum and compensation. */
function twoSumStep(sum: number, c: number, v: number): [number, number] {
  const t = sum + v;
  const nc = Math.abs(sum) >= Math.abs(v) ? c + (sum - t + v) : c + (v - t + sum);
  return [t, nc];
}
