/**
 * The grid reductions' one kernel: Σ w·v and Σ w over the present values of
 * values[at .. at+n) with weights weights[wAt .. wAt+n), written to out[0] and out[1]. Present
 * follows the engine's rule (series/missing.ts): a finite number; NaN and ±Infinity add nothing.
 * A weight of 0 adds nothing, so masks and cells outside a box are zero weights. Two independent
 * accumulators break the floating-point add latency chain; summing each row in double and rows
 * in a second level keeps rounding near n·2^-53 relative without compensation (Higham 2002,
 * Accuracy and Stability of Numerical Algorithms, §4.2). No allocation.
 */
export function weightedSum(
  values: ArrayLike<number>,
  at: number,
  weights: ArrayLike<number>,
  wAt: number,
  n: number,
  out: Float64Array,
): void {
  let s0 = 0, s1 = 0, w0 = 0, w1 = 0;
  let j = 0;
  for (; j + 1 < n; j += 2) {
    const v0 = values[at + j], v1 = values[at + j + 1];
    // v - v is 0 exactly for finite v, NaN for NaN and ±Infinity.
    if (v0 - v0 === 0) { s0 += weights[wAt + j] * v0; w0 += weights[wAt + j]; }
    if (v1 - v1 === 0) { s1 += weights[wAt + j + 1] * v1; w1 += weights[wAt + j + 1]; }
  }
  if (j < n) {
    const v = values[at + j];
    if (v - v === 0) { s0 += weights[wAt + j] * v; w0 += weights[wAt + j]; }
  }
  out[0] = s0 + s1;
  out[1] = w0 + w1;
}
