import { isPresent } from '../series/missing';
import { neumaierSum } from './neumaier-sum';
import { maxAbs, overflowSafeScale } from './scale';

/**
 * Arithmetic mean of the present (finite) values; null when none is present.
 * Compensated (Neumaier) sum so that NIST NumAcc-style data (large offset, small spread) keeps
 * its digits; values near 1e308 are scaled by an exact power of two so the sum cannot overflow.
 */
export function mean(values: ArrayLike<number | null>): number | null {
  let n = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (isPresent(v)) n++;
  }
  if (n === 0) return null;
  const scale = overflowSafeScale(maxAbs(values));
  if (scale === 1) return neumaierSum(values) / n;
  const scaled = Array.from(values, (v) => (v === null ? null : v * scale));
  return neumaierSum(scaled) / n / scale;
}
