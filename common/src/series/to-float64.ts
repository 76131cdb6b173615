import { isPresent } from './missing';

/** Copies values into a Float64Array with NaN for every missing value (the engine's fast-path form). */
export function toFloat64(values: ArrayLike<number | null>): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    out[i] = isPresent(v) ? v : NaN;
  }
  return out;
}
