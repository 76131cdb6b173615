/**
 * One time slice's anomalies against a per-cell climatology (cellClimatology's 12 × cells layout):
 * out[c] = slice[c] − climatology[calendar month of `month`][c], NaN where either is missing or
 * mask[c] ≠ 0. `month` counts months since 0000-01. Writes into `out` (no allocation).
 */
export function anomalySlice(slice: ArrayLike<number>, climatology: Float64Array, month: number, out: Float64Array, mask?: ArrayLike<number>): Float64Array {
  const cells = out.length;
  const off = (month % 12) * cells;
  for (let c = 0; c < cells; c++) {
    const v = slice[c] - climatology[off + c];
    // A non-finite input or climatology leaves NaN (Infinity − Infinity is NaN; Infinity − x is not).
    out[c] = v - v === 0 && !(mask && mask[c]) ? v : NaN;
  }
  return out;
}
