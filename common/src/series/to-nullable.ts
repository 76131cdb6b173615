/** Copies values into a plain array with null for every missing value (NaN, ±Infinity), ready for JSON. */
export function toNullable(values: ArrayLike<number>): (number | null)[] {
  const out = new Array<number | null>(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    out[i] = Number.isFinite(v) ? v : null;
  }
  return out;
}
