/**
 * Cell thicknesses (level, column) of a z-level grid with partial bottom cells (Adcroft, Hill &
 * Marshall 1997, "Representation of topography by shaved cells in a height coordinate ocean
 * model", Mon. Weather Rev. 125, 2293–2315): each column's sea floor at `columnDepth` (m, positive
 * down; a model's `deptho`) cuts the layer that holds it, and layers below it are dry (thickness 0).
 * A NaN depth (land) makes the whole column dry.
 */
export function partialBottomThickness(top: ArrayLike<number>, bottom: ArrayLike<number>, columnDepth: ArrayLike<number>): Float64Array {
  const nz = top.length;
  const n = columnDepth.length;
  const out = new Float64Array(nz * n);
  for (let k = 0; k < nz; k++) {
    for (let c = 0; c < n; c++) {
      const floor = columnDepth[c];
      if (floor !== floor) continue;
      out[k * n + c] = Math.max(0, Math.min(bottom[k], floor) - top[k]);
    }
  }
  return out;
}
