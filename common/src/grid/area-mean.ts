import { weightedSum } from './weighted-sum';

/** Σ A·v and Σ A over the present cells with a non-zero mask, through the grid's one kernel. */
function maskedSums(field: ArrayLike<number>, areas: ArrayLike<number>, mask?: ArrayLike<number | boolean>): Float64Array {
  const weights = mask ? Float64Array.from(areas, (a, k) => (mask[k] ? a : 0)) : areas;
  const out = new Float64Array(2);
  const block = new Float64Array(2);
  // Two levels (blocks of 64, then blocks), as the kernel's callers sum rows then rows' totals.
  for (let k = 0; k < areas.length; k += 64) {
    weightedSum(field, k, weights, k, Math.min(64, areas.length - k), block);
    out[0] += block[0];
    out[1] += block[1];
  }
  return out;
}

/**
 * Area-weighted mean Σ A·v / Σ A of a (lat, lon) field over the cells with a present (finite)
 * value and, if `mask` is given, a non-zero mask. null when no cell qualifies.
 */
export function areaWeightedMean(field: ArrayLike<number>, areas: ArrayLike<number>, mask?: ArrayLike<number | boolean>): number | null {
  const [s, w] = maskedSums(field, areas, mask);
  return w > 0 ? s / w : null;
}

/**
 * Area integral Σ A·v of a (lat, lon) field (e.g. mol C m-2 × m² → mol C) over the cells with a
 * present value and a non-zero mask. Missing cells contribute nothing — pair it with the covered
 * area if gaps matter. null when no cell of non-zero area qualifies.
 */
export function areaIntegral(field: ArrayLike<number>, areas: ArrayLike<number>, mask?: ArrayLike<number | boolean>): number | null {
  const [s, w] = maskedSums(field, areas, mask);
  return w > 0 ? s : null;
}
