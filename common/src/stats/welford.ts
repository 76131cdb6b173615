import { isPresent } from '../series/missing';
import { maxAbs, overflowSafeScale } from './scale';

/** Count, mean and sum of squared deviations (M2) of the present values. */
export interface Moments {
  n: number;
  mean: number;
  m2: number;
}

/**
 * One-pass mean and sum of squared deviations of the present (finite) values.
 *
 * Welford, B.P. (1962), "Note on a method for calculating corrected sums of squares and products",
 * Technometrics 4(3):419–420 (as in Knuth, TAOCP vol. 2, §4.2.2): updating the mean and M2 by
 * deviations avoids the cancellation of Σx² − (Σx)²/n, e.g. for NIST NumAcc4 (1e7 + 0.1 steps).
 * Values are scaled by an exact power of two when near 1e300 so M2 cannot overflow.
 */
export function welford(values: ArrayLike<number | null>): Moments {
  const scale = overflowSafeScale(maxAbs(values));
  let n = 0;
  let mean = 0;
  let m2 = 0;
  for (let i = 0; i < values.length; i++) {
    const raw = values[i];
    if (!isPresent(raw)) continue;
    const v = raw * scale;
    n++;
    const delta = v - mean;
    mean += delta / n;
    m2 += delta * (v - mean);
  }
  // M2 in original units may overflow for 1e300 data; sd is unscaled by callers via sqrt first.
  return { n, mean: mean / scale, m2: m2 / (scale * scale) };
}

/**
 * Sample standard deviation (n − 1) via Welford, computed on scaled values so that data near
 * 1e300 gives a finite result. null when fewer than two values are present.
 */
export function sampleSd(values: ArrayLike<number | null>): number | null {
  const scale = overflowSafeScale(maxAbs(values));
  const scaled = scale === 1 ? values : Array.from(values, (v) => (v === null ? null : v * scale));
  const { n, m2 } = welford(scaled);
  if (n < 2) return null;
  return Math.sqrt(m2 / (n - 1)) / scale;
}

/** Sample variance (n − 1); null when fewer than two values are present. May be Infinity for data near 1e300. */
export function sampleVariance(values: ArrayLike<number | null>): number | null {
  const { n, m2 } = welford(values);
  return n < 2 ? null : m2 / (n - 1);
}
