/**
 * The part of each cell's thickness that lies between the surface and `maxDepth` m, for 0–H
 * integrals: cells wholly above H keep their thickness, the cell holding H is clipped to H − top,
 * cells below get 0. `thickness` is (level, cell), row-major with the level slowest, levels from
 * the surface down; each cell's top is the sum of the thicknesses above it in its column, so
 * varying layers (`thkcello`) and partial bottom cells are followed cell by cell. A NaN thickness
 * (land) counts as 0. `maxDepth` = Infinity keeps every wet cell ("full depth").
 */
export function thicknessWithinDepth(thickness: ArrayLike<number>, cells: number, maxDepth: number): Float64Array {
  if (cells < 1 || thickness.length % cells !== 0) throw new RangeError(`thicknessWithinDepth: ${thickness.length} thicknesses are not levels × ${cells} cells`);
  if (!(maxDepth >= 0)) throw new RangeError(`thicknessWithinDepth: the depth limit must be ≥ 0 m, got ${maxDepth}`);
  const out = new Float64Array(thickness.length);
  const levels = thickness.length / cells;
  for (let c = 0; c < cells; c++) {
    let top = 0;
    for (let k = 0; k < levels; k++) {
      const i = k * cells + c;
      const h = thickness[i] > 0 ? thickness[i] : 0;
      out[i] = Math.max(0, Math.min(h, maxDepth - top));
      top += h;
    }
  }
  return out;
}
