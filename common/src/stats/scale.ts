import { isPresent } from '../series/missing';

/**
 * A power of two that brings values of magnitude up to maxAbs below 2^500, so that squares and sums
 * of squares of values near 1e300 cannot overflow. Multiplying by a power of two is exact (no rounding),
 * so scaled statistics are unscaled without error. Returns 1 when no scaling is needed.
 */
export function overflowSafeScale(maxAbs: number): number {
  if (!(maxAbs > 1e150)) return 1;
  // 2^-k with 2^k >= maxAbs, so |v| * scale <= 1.
  const k = Math.ceil(Math.log2(maxAbs));
  return Math.pow(2, -k);
}

/** The largest |v| over the present (finite) values, 0 if there are none. */
export function maxAbs(values: ArrayLike<number | null>): number {
  let m = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (isPresent(v) && Math.abs(v) > m) m = Math.abs(v);
  }
  return m;
}
