/** A run of latitude rows inside a latitude range, in storage order. */
export interface RegionRows {
  start: number;
  count: number;
  lat: Float64Array;
}

/**
 * The latitude rows whose centres lie in [south, north] (either order of the stored latitudes,
 * ascending or descending); every row without a range. Rows of a monotonic axis inside a range
 * are consecutive, so the result is one slab. Empty (count 0) when no centre lies inside.
 */
export function regionRows(latCentres: ArrayLike<number>, range?: readonly [number, number]): RegionRows {
  const lo = range ? Math.min(range[0], range[1]) : Number.NEGATIVE_INFINITY;
  const hi = range ? Math.max(range[0], range[1]) : Number.POSITIVE_INFINITY;
  let start = -1;
  let end = -1;
  for (let j = 0; j < latCentres.length; j++) {
    if (latCentres[j] >= lo && latCentres[j] <= hi) {
      if (start < 0) start = j;
      end = j;
    }
  }
  if (start < 0) return { start: 0, count: 0, lat: new Float64Array(0) };
  return { start, count: end - start + 1, lat: Float64Array.from({ length: end - start + 1 }, (_, k) => latCentres[start + k]) };
}
