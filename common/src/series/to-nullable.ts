import { isPresent } from './missing';

/** Copies values into a plain array with null for every missing value (NaN, ±Infinity), ready for JSON. */
export function toNullable(values: ArrayLike<number>): (number | null)[] {
  // Doubles first, nulls patched in afterwards: a V8 array holding only doubles stays unboxed.
  const out = new Array<number | null>(values.length);
  let anyMissing = false;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    out[i] = v;
    if (v - v !== 0) anyMissing = true;
  }
  if (anyMissing) for (let i = 0; i < out.length; i++) if (!isPresent(out[i])) out[i] = null;
  return out;
}
