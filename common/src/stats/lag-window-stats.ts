/** Slots of the lag kernel's output array. */
export const LAG_N = 0;
export const LAG_R = 1;
export const LAG_R1X = 2;
export const LAG_R1Y = 3;

/**
 * The lag scan's inner kernel: over the window x[xOff..xOff+len), y[yOff..yOff+len) (prepared by
 * prepareForCorrelation; NaN = missing) it writes into `out` the number of pairs with both present,
 * Pearson's r, and the lag-1 autocorrelation of each member over the paired values,
 * r1 = Σ(a_t − ā)(a_{t+1} − ā)/Σ(a_t − ā)² with ā the paired mean and products only where t and
 * t+1 are both paired (NIST StRD form). One pass, no allocation; r and r1 are NaN when undefined
 * (n < 3, or a member whose centred sum of squares is below 1e-13 of its raw one: constant to
 * working precision).
 */
export function lagWindowStats(x: Float64Array, xOff: number, y: Float64Array, yOff: number, len: number, out: Float64Array): void {
  let n = 0, sa = 0, sb = 0, saa = 0, sbb = 0, sab = 0;
  let m = 0, pa1 = 0, pb1 = 0, leadA = 0, trailA = 0, leadB = 0, trailB = 0;
  let prevOk = false, pa = 0, pb = 0;
  for (let i = 0; i < len; i++) {
    const a = x[xOff + i];
    const b = y[yOff + i];
    if (a === a && b === b) {
      n++;
      sa += a; sb += b; saa += a * a; sbb += b * b; sab += a * b;
      if (prevOk) {
        m++;
        pa1 += pa * a; pb1 += pb * b;
        leadA += pa; trailA += a; leadB += pb; trailB += b;
      }
      prevOk = true; pa = a; pb = b;
    } else prevOk = false;
  }
  out[LAG_N] = n;
  out[LAG_R] = out[LAG_R1X] = out[LAG_R1Y] = NaN;
  if (n < 3) return;
  const ma = sa / n;
  const mb = sb / n;
  const sxx = saa - sa * ma;
  const syy = sbb - sb * mb;
  if (!(sxx > 1e-13 * saa) || !(syy > 1e-13 * sbb)) return;
  const r = (sab - sa * mb) / Math.sqrt(sxx * syy);
  out[LAG_R] = r > 1 ? 1 : r < -1 ? -1 : r;
  // Σ(a_t − ā)(a_{t+1} − ā) expanded over the m adjacent pairs.
  out[LAG_R1X] = (pa1 - ma * (leadA + trailA) + m * ma * ma) / sxx;
  out[LAG_R1Y] = (pb1 - mb * (leadB + trailB) + m * mb * mb) / syy;
}
