import { isPresent } from '../series/missing';
import { maxAbs, overflowSafeScale } from './scale';

/**
 * Pearson product-moment correlation of the pairs where both x[i] and y[i] are present.
 * Two passes (means, then centred cross-products), which keeps NIST-style large offsets exact,
 * on power-of-two-scaled values so that data near 1e300 cannot overflow. null when fewer than
 * three pairs exist or either member is constant over the pairs (r undefined).
 */
export function pearson(x: ArrayLike<number | null>, y: ArrayLike<number | null>): number | null {
  const len = Math.min(x.length, y.length);
  const sx = overflowSafeScale(maxAbs(x));
  const sy = overflowSafeScale(maxAbs(y));
  let n = 0;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < len; i++) {
    const a = x[i];
    const b = y[i];
    if (!isPresent(a) || !isPresent(b)) continue;
    n++;
    // Running means (Welford) rather than sums: exact enough and cannot overflow.
    mx += (a * sx - mx) / n;
    my += (b * sy - my) / n;
  }
  if (n < 3) return null;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (let i = 0; i < len; i++) {
    const a = x[i];
    const b = y[i];
    if (!isPresent(a) || !isPresent(b)) continue;
    const da = a * sx - mx;
    const db = b * sy - my;
    sxx += da * da;
    syy += db * db;
    sxy += da * db;
  }
  if (sxx === 0 || syy === 0) return null;
  const r = sxy / Math.sqrt(sxx * syy);
  return Math.max(-1, Math.min(1, r));
}
