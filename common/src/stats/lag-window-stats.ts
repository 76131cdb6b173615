import type { LagPrefixSums } from './lag-prefix-sums';

/** Slot of the lag kernel's output array: number of pairs. */
export const LAG_N = 0;
/** Slot: Pearson's r (NaN when undefined). */
export const LAG_R = 1;
/** Slot: lag-1 autocorrelation of x over the pairs. */
export const LAG_R1X = 2;
/** Slot: lag-1 autocorrelation of y over the pairs. */
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
  finish(n, sa, sb, saa, sbb, sab, m, pa1, pb1, leadA, trailA, leadB, trailB, out);
}

/**
 * The same statistics as lagWindowStats for a window with no missing value in either member,
 * from prefix sums (lagPrefixSums): only the cross-product Σ x·y needs a pass over the window,
 * so the scan costs one multiply-add per pair and lag. Four accumulators break the add latency chain.
 */
export function lagWindowStatsComplete(
  x: Float64Array,
  px: LagPrefixSums,
  xOff: number,
  y: Float64Array,
  py: LagPrefixSums,
  yOff: number,
  len: number,
  out: Float64Array,
): void {
  let c0 = 0, c1 = 0, c2 = 0, c3 = 0;
  let i = xOff;
  const shift = yOff - xOff;
  const stop = xOff + len;
  for (; i + 3 < stop; i += 4) {
    c0 += x[i] * y[i + shift];
    c1 += x[i + 1] * y[i + 1 + shift];
    c2 += x[i + 2] * y[i + 2 + shift];
    c3 += x[i + 3] * y[i + 3 + shift];
  }
  for (; i < stop; i++) c0 += x[i] * y[i + shift];
  lagWindowStatsFromSums(px, xOff, py, yOff, len, c0 + c1 + (c2 + c3), out);
}

/**
 * lagWindowStatsComplete with the window's cross-product Σ x·y already known (e.g. from
 * laggedCrossProducts): everything else comes from the prefix sums in O(1).
 */
export function lagWindowStatsFromSums(px: LagPrefixSums, xOff: number, py: LagPrefixSums, yOff: number, len: number, sxy: number, out: Float64Array): void {
  const xEnd = xOff + len;
  const yEnd = yOff + len;
  finish(
    len,
    px.sum[xEnd] - px.sum[xOff], py.sum[yEnd] - py.sum[yOff],
    px.sumSq[xEnd] - px.sumSq[xOff], py.sumSq[yEnd] - py.sumSq[yOff],
    sxy,
    len - 1,
    px.lag1[xEnd - 1] - px.lag1[xOff], py.lag1[yEnd - 1] - py.lag1[yOff],
    // Over adjacent pairs the leading members are all but the last value, the trailing all but the first.
    px.sum[xEnd - 1] - px.sum[xOff], px.sum[xEnd] - px.sum[xOff + 1],
    py.sum[yEnd - 1] - py.sum[yOff], py.sum[yEnd] - py.sum[yOff + 1],
    out,
  );
}

/** Turns the window's raw sums into n, r, r1x, r1y (NaN when undefined) in `out`. */
function finish(
  n: number, sa: number, sb: number, saa: number, sbb: number, sab: number,
  m: number, pa1: number, pb1: number, leadA: number, trailA: number, leadB: number, trailB: number,
  out: Float64Array,
): void {
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
