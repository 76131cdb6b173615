/**
 * Centres x on the mean of its present values and scales it by an exact power of two so that
 * |value| ≤ 1 (NaN stays NaN). Correlations are invariant to both, and afterwards the one-pass
 * sums of the lag kernel neither overflow (1e300 data) nor cancel (1e8 offsets, as NIST NumAcc):
 * the "shifted data" remedy of Chan, Golub & LeVeque (1983), Am. Statistician 37(3):242–247.
 */
export function prepareForCorrelation(x: Float64Array): Float64Array {
  let n = 0;
  let mean = 0;
  for (let i = 0; i < x.length; i++) {
    const v = x[i];
    if (v === v) mean += (v - mean) / ++n;
  }
  let max = 0;
  for (let i = 0; i < x.length; i++) {
    const d = Math.abs(x[i] - mean);
    if (d > max) max = d;
  }
  const scale = max > 0 && Number.isFinite(max) ? Math.pow(2, -Math.ceil(Math.log2(max))) : 1;
  const out = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) out[i] = (x[i] - mean) * scale;
  return out;
}
