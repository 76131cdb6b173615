/** The volume integral, counted volume and volume-weighted mean of a 3-D field over a region. */
export interface VolumeIntegral {
  /** Σ A·h·v over the counted cells (e.g. mol m-3 × m³ → mol). */
  integral: number;
  /** Σ A·h over the same cells. */
  volume: number;
  /** integral / volume. */
  mean: number;
  /** How many cells (level × column) were counted. */
  cells: number;
}

/**
 * Volume integral of one time step of a (level, cell) field, row-major with the level slowest:
 * Σ_k Σ_c A_c · h_kc · v_kc over the columns c of the region (mask non-zero) and the cells with a
 * present value and a positive thickness. `thickness` is (level, cell) — a model's `thkcello`,
 * a partial bottom cell's own height, or a thickness already clipped to a depth range (see
 * thicknessWithinDepth) — so the same function gives 0–H and full-depth integrals.
 * Sums are compensated (Neumaier 1974, ZAMM 54:39–51). null when no cell counts.
 */
export function volumeIntegral(
  values: ArrayLike<number>,
  areas: ArrayLike<number>,
  thickness: ArrayLike<number>,
  mask?: ArrayLike<number | boolean>,
): VolumeIntegral | null {
  const n = areas.length;
  if (n === 0 || values.length !== thickness.length || values.length % n !== 0 || (mask && mask.length !== n)) {
    throw new RangeError(`volumeIntegral: ${values.length} values and ${thickness.length} thicknesses are not levels × ${n} cells${mask ? ` (mask of ${mask.length})` : ''}`);
  }
  let s = 0;
  let sc = 0;
  let vol = 0;
  let vc = 0;
  let cells = 0;
  // Level by level, so the column index needs no division per value.
  for (let base = 0; base < values.length; base += n) {
    for (let c = 0; c < n; c++) {
      if (mask && !mask[c]) continue;
      const i = base + c;
      const v = values[i];
      const w = areas[c] * thickness[i];
      if (v !== v || !(w > 0)) continue;
      const x = w * v;
      const t = s + x;
      sc += Math.abs(s) >= Math.abs(x) ? s - t + x : x - t + s;
      s = t;
      const u = vol + w;
      vc += vol >= w ? vol - u + w : w - u + vol;
      vol = u;
      cells++;
    }
  }
  if (cells === 0) return null;
  const integral = s + sc;
  const volume = vol + vc;
  return { integral, volume, mean: integral / volume, cells };
}
