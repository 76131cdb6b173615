/** Columns of a grid inside a longitude range, eastward from its western edge. */
export interface RegionColumns {
  /** Storage indices of the columns, in eastward order from `west`. */
  index: Int32Array;
  /** Their longitudes, unwrapped to increase eastward from `west` (e.g. 175, 185 for a box 170 → −170). */
  lon: Float64Array;
}

/**
 * The longitude columns whose centres lie in [west, east], going eastward from west: the range may
 * cross the antimeridian or 0° (west > east, e.g. 170 → −170, or 350 → 10) and the grid may use
 * either −180…180 or 0…360, with the same answer. Without a range every column is kept in storage
 * order with its stored longitude. A span of 360° or more is the whole circle.
 */
export function regionColumns(lonCentres: ArrayLike<number>, range?: readonly [number, number]): RegionColumns {
  const n = lonCentres.length;
  if (!range) return { index: Int32Array.from({ length: n }, (_, i) => i), lon: Float64Array.from(lonCentres) };
  const [west, east] = range;
  let span = east - west;
  if (span < 360 && span <= 0) span += 360;
  const picked: { i: number; d: number }[] = [];
  for (let i = 0; i < n; i++) {
    const d = (((lonCentres[i] - west) % 360) + 360) % 360;
    if (span >= 360 || d <= span) picked.push({ i, d });
  }
  picked.sort((a, b) => a.d - b.d);
  return { index: Int32Array.from(picked, (p) => p.i), lon: Float64Array.from(picked, (p) => west + p.d) };
}
