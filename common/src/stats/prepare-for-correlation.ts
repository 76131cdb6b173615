/**
 * Centres x on the mean of its present values and scales it by an exact power of two so that
 * |value| ≤ 1 (NaN stays NaN). Correlations are invariant to both, and afterwards the one-pass
 * sums of the lag kernel neither overflow (1e300 data) nor cancel (1e8 offsets, as NIST NumAcc):
 * the "shifted data" remedy of Chan, Golub & LeVeque (1983), Am. Statistician 37(3):242–247.
 */
// `out` (length ≥ x.length) may be x itself or a scratch buffer.
export function prepareForCorrelation(x: Float64Array, out: Float64Array = new Float64Array(x.length)): Float64Array {
  // Any centre near the mean serves (correlation ignores shifts), so a plain sum is enough here;
  // values near 1e308 would overflow it, hence the running-mean fallback for a non-finite sum.
  let n = 0;
  let sum = 0;
  for (let i = 0; i < x.length; i++) {
    const v = x[i];
    if (v === v) {
      sum += v;
      n++;
    }
  }
  let mean = n > 0 ? sum / n : 0;
  if (!Number.isFinite(mean)) {
    mean = 0;
    for (let i = 0, k = 0; i < x.length; i++) if (x[i] === x[i]) mean += (x[i] - mean) / ++k;
  }
  let max = 0;
  for (let i = 0; i < x.length; i++) {
    const d = Math.abs(x[i] - mean);
    if (d > max) max = d;
  }
  const scale = max > 0 && Number.isFinite(max) ? Math.pow(2, -Math.ceil(Math.log2(max))) : 1;
  for (let i = 0; i < x.length; i++) out[i] = (x[i] - mean) * scale;
  return out;
}
