/**
 * Centred running mean of odd `width` (3: mean of t−1, t, t+1), as used for 3-month indices such
 * as NOAA CPC's ONI. NaN where the window runs off the series or holds a missing (NaN) value — no
 * partial windows, so a smoothed value always averages exactly `width` months. Width 1 copies.
 * Each window is summed directly (width ≤ a few dozen), which avoids running-sum drift.
 */
export function runningMean(x: Float64Array, width: number): Float64Array {
  if (!Number.isInteger(width) || width < 1 || width % 2 === 0) {
    throw new RangeError(`running mean width must be a positive odd integer, got ${width}`);
  }
  const half = (width - 1) / 2;
  const out = new Float64Array(x.length).fill(NaN);
  for (let t = half; t < x.length - half; t++) {
    let s = 0;
    for (let k = t - half; k <= t + half; k++) s += x[k];
    // A NaN anywhere in the window propagates to s, which is what we want.
    out[t] = s / width;
  }
  return out;
}
