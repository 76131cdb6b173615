/** The area integral, covered area and area-weighted mean of a horizontal field over a region. */
export interface RegionIntegral {
  /** Σ A·v over the counted cells (e.g. mol m-2 s-1 × m² → mol s-1). */
  integral: number;
  /** Σ A over the same cells, m² when the areas are in m². */
  area: number;
  /** integral / area. */
  mean: number;
  /** How many cells were counted. */
  cells: number;
}

/**
 * Area-weighted integral and mean of one horizontal slice over the cells of a region, with the
 * cell areas given explicitly (a model's `areacello`; on a curvilinear grid they cannot be derived
 * from the centres). A cell counts when its mask is non-zero, its value is present (not NaN) and
 * its area is positive. Sums are compensated (Neumaier 1974, ZAMM 54:39–51) because a global sum
 * of ~10^5 cells of mixed sign is what a budget residual is judged against. null when no cell
 * counts. Throws RangeError when the arrays do not describe the same cells.
 */
export function regionIntegral(values: ArrayLike<number>, areas: ArrayLike<number>, mask?: ArrayLike<number | boolean>): RegionIntegral | null {
  if (values.length !== areas.length || (mask && mask.length !== areas.length)) {
    throw new RangeError(`regionIntegral: ${values.length} values, ${areas.length} cell areas${mask ? ` and ${mask.length} mask cells` : ''} do not describe one grid`);
  }
  let s = 0;
  let sc = 0;
  let a = 0;
  let ac = 0;
  let cells = 0;
  for (let k = 0; k < areas.length; k++) {
    const v = values[k];
    const w = areas[k];
    if (v !== v || !(w > 0) || (mask && !mask[k])) continue;
    const x = w * v;
    const t = s + x;
    sc += Math.abs(s) >= Math.abs(x) ? s - t + x : x - t + s;
    s = t;
    const u = a + w;
    ac += a >= w ? a - u + w : w - u + a;
    a = u;
    cells++;
  }
  if (cells === 0) return null;
  const integral = s + sc;
  const area = a + ac;
  return { integral, area, mean: integral / area, cells };
}
