/**
 * Area-weighted mean Σ A·v / Σ A of a (lat, lon) field over the cells with a present (non-NaN)
 * value and, if `mask` is given, a non-zero mask. null when no cell qualifies.
 */
export function areaWeightedMean(field: ArrayLike<number>, areas: ArrayLike<number>, mask?: ArrayLike<number | boolean>): number | null {
  let s = 0;
  let w = 0;
  for (let k = 0; k < areas.length; k++) {
    const v = field[k];
    if (v !== v || (mask && !mask[k])) continue;
    s += areas[k] * v;
    w += areas[k];
  }
  return w > 0 ? s / w : null;
}

/**
 * Area integral Σ A·v of a (lat, lon) field (e.g. mol C m-2 × m² → mol C) over the cells with a
 * present value and a non-zero mask. Missing cells contribute nothing — pair it with the covered
 * area if gaps matter. null when no cell qualifies.
 */
export function areaIntegral(field: ArrayLike<number>, areas: ArrayLike<number>, mask?: ArrayLike<number | boolean>): number | null {
  let s = 0;
  let any = false;
  for (let k = 0; k < areas.length; k++) {
    const v = field[k];
    if (v !== v || (mask && !mask[k])) continue;
    s += areas[k] * v;
    any = true;
  }
  return any ? s : null;
}
