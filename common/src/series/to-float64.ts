/** Copies values (the engine's missing-value rule, series/missing.ts) into a Float64Array with NaN for every missing value (the engine's fast-path form). */
export function toFloat64(values: ArrayLike<number | null>): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    // Same rule as isPresent(), inlined for the hot path: v − v is 0 only for a finite number.
    out[i] = v !== null && v - v === 0 ? v : NaN;
  }
  return out;
}

/** Like toFloat64, writing into `out` (length ≥ values.length) and returning the filled view. */
export function toFloat64Into(values: ArrayLike<number | null>, out: Float64Array): Float64Array {
  const n = values.length;
  for (let i = 0; i < n; i++) {
    const v = values[i];
    out[i] = v !== null && v - v === 0 ? v : NaN;
  }
  return n === out.length ? out : out.subarray(0, n);
}
