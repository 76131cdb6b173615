import { maxAbs, overflowSafeScale } from '../stats/scale';

/**
 * Root mean square of the present (non-NaN) values; null when none is present. Squares are
 * summed after an exact power-of-two scaling so that values near 1e300 do not overflow.
 */
export function rms(values: Float64Array): number | null {
  const scale = overflowSafeScale(maxAbs(values));
  let s = 0;
  let c = 0;
  let n = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i] * scale;
    if (v !== v) continue;
    n++;
    const sq = v * v;
    const t = s + sq;
    // Neumaier (1974) compensation; all terms are non-negative, so s ≥ sq after the first.
    c += s >= sq ? s - t + sq : sq - t + s;
    s = t;
  }
  return n === 0 ? null : Math.sqrt((s + c) / n) / scale;
}
